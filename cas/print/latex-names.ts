import { LETTER_COMMANDS, SUBSCRIPT_COMMANDS } from "../parse/latex-vocabulary";

const SUBSCRIPT_WORDS: Readonly<Record<string, string>> = { plus: "+", minus: "-" };
const COMMAND_WORDS = [...LETTER_COMMANDS, ...SUBSCRIPT_COMMANDS].sort((a, b) => b.length - a.length);

/**
 * LaTeX for a plain identifier, the inverse of the reader's naming: `theta` →
 * `\theta`, `r_s` → `r_{s}`, `g_thetatheta` → `g_{\theta\theta}`, `M_odot` →
 * `M_{\odot}`, `V_eff` → `V_{\mathrm{eff}}`, `GM` → `\mathrm{GM}`, `r_plus` → `r_{+}`.
 *
 * @example
 * latexName("g_tphi")   // "g_{t\\phi}"
 */
export function latexName(name: string): string {
  if (!/^[A-Za-z][A-Za-z0-9_]*$/.test(name)) return `\\mathrm{${name.replace(/[^A-Za-z0-9]/g, "")}}`;
  const cut = name.indexOf("_");
  const base = cut < 0 ? name : name.slice(0, cut);
  const sub = cut < 0 ? "" : name.slice(cut + 1);
  const baseTex = LETTER_COMMANDS.has(base) ? `\\${base}` : base.length === 1 ? base : `\\mathrm{${base}}`;
  return sub === "" ? baseTex : `${baseTex}_{${subscriptLatex(sub)}}`;
}

function subscriptLatex(sub: string): string {
  if (SUBSCRIPT_WORDS[sub]) return SUBSCRIPT_WORDS[sub];
  const pieces: string[] = [];
  let sawCommand = false;
  let p = 0;
  while (p < sub.length) {
    const word = COMMAND_WORDS.find((w) => sub.startsWith(w, p));
    if (word) {
      pieces.push(`\\${word}`);
      sawCommand = true;
      p += word.length;
    } else {
      pieces.push(sub[p]);
      p += 1;
    }
  }
  // A longer run of plain letters is a label (eff, ISCO), set upright; one or two letters are indices (tt, rr).
  if (!sawCommand && /^[A-Za-z]{3,}$/.test(sub)) return `\\mathrm{${sub}}`;
  let out = "";
  for (const piece of pieces) {
    // "\theta t" needs the space; "\theta\phi" and "tt" do not.
    out += /\\[A-Za-z]+$/.test(out) && /^[A-Za-z]/.test(piece) ? ` ${piece}` : piece;
  }
  return out;
}
