import { fail } from "./errors";
import { IGNORED_COMMANDS, SPACING_COMMANDS } from "./latex-vocabulary";

/**
 * One LaTeX token. Whitespace and spacing commands are not tokens: they are
 * remembered on the next token (`ws` for plain whitespace, `thin` for `\,`,
 * `\;`, `~`, `\quad` …) because they decide where a bare function argument ends
 * and which letters form one name.
 */
export interface LatexToken {
  readonly kind: "cmd" | "letter" | "digit" | "char" | "lbrace" | "rbrace" | "open" | "close" | "bar" | "end";
  /** Command name without the backslash, the character, or the delimiter of open/close. */
  readonly text: string;
  readonly pos: number;
  readonly end: number;
  /** `\left(` / `\right)` (and `\lvert`…), as opposed to bare `(`. */
  readonly sized: boolean;
  readonly ws: boolean;
  readonly thin: boolean;
}

export interface TokenStream {
  readonly tokens: readonly LatexToken[];
  /** For each `{`, the index of its `}` (and the reverse). */
  readonly partner: ReadonlyMap<number, number>;
}

const LEFT_DELIMS: Readonly<Record<string, string>> = { "(": "(", "[": "[", "|": "|", ".": ".", "\\{": "{", "\\lbrace": "{", "\\lvert": "|", "\\vert": "|" };
const RIGHT_DELIMS: Readonly<Record<string, string>> = { ")": ")", "]": "]", "|": "|", ".": ".", "\\}": "}", "\\rbrace": "}", "\\rvert": "|", "\\vert": "|" };
const ORDINARY_CHARS = "+-*/^_=<>,.'!:;";

/**
 * Unicode characters that pasted text carries, read as the command they stand
 * for (the position stays that of the character). U+2212 is the typographic minus.
 */
const UNICODE_COMMANDS: Readonly<Record<string, string>> = {
  "α": "alpha", "β": "beta", "γ": "gamma", "δ": "delta", "ε": "epsilon", "ζ": "zeta", "η": "eta", "θ": "theta",
  "ϑ": "vartheta", "ι": "iota", "κ": "kappa", "λ": "lambda", "μ": "mu", "ν": "nu", "ξ": "xi", "π": "pi", "ρ": "rho",
  "σ": "sigma", "τ": "tau", "υ": "upsilon", "φ": "phi", "ϕ": "phi", "χ": "chi", "ψ": "psi", "ω": "omega",
  "Γ": "Gamma", "Δ": "Delta", "Θ": "Theta", "Λ": "Lambda", "Ξ": "Xi", "Π": "Pi", "Σ": "Sigma", "Φ": "Phi", "Ψ": "Psi", "Ω": "Omega",
  "ℓ": "ell", "ℏ": "hbar", "∞": "infty", "∂": "partial", "·": "cdot", "⋅": "cdot", "×": "times",
  "≤": "le", "≥": "ge", "≠": "neq", "≈": "approx", "±": "pm", "→": "to", "⊙": "odot",
};
const UNICODE_CHARS: Readonly<Record<string, string>> = { "−": "-", "–": "-" };

const isLetter = (c: string) => (c >= "a" && c <= "z") || (c >= "A" && c <= "Z");
const isDigit = (c: string) => c >= "0" && c <= "9";
const isSpace = (c: string) => c === " " || c === "\t" || c === "\n" || c === "\r";

/**
 * Splits LaTeX into tokens and checks that braces balance, so the error names
 * the brace that is open.
 *
 * @example
 * tokenizeLatex("\\frac{1}{r}").tokens.map((t) => t.text)  // ["frac", "{", "1", "}", "{", "r", "}", ""]
 */
export function tokenizeLatex(source: string): TokenStream {
  const tokens: LatexToken[] = [];
  let ws = false;
  let thin = false;
  const push = (kind: LatexToken["kind"], text: string, pos: number, end: number, sized = false) => {
    tokens.push({ kind, text, pos, end, sized, ws, thin });
    ws = false;
    thin = false;
  };
  let i = 0;
  const n = source.length;
  while (i < n) {
    const c = source[i];
    if (isSpace(c)) { ws = true; i += 1; continue; }
    if (c === "\\") {
      const d = source[i + 1];
      if (d === undefined) fail("unexpected", `a lone backslash at ${i}`, i);
      if (isLetter(d)) {
        let j = i + 1;
        while (j < n && isLetter(source[j])) j += 1;
        const name = source.slice(i + 1, j);
        if (IGNORED_COMMANDS.has(name)) { i = j; continue; }
        if (SPACING_COMMANDS.has(name)) { thin = true; i = j; continue; }
        if (name === "left" || name === "right") {
          let k = j;
          while (k < n && isSpace(source[k])) k += 1;
          const table = name === "left" ? LEFT_DELIMS : RIGHT_DELIMS;
          const m = /^(\\[a-zA-Z]+|\\[{}|]|.)/.exec(source.slice(k, k + 12));
          const delim = m ? table[m[1]] : undefined;
          if (delim === undefined) fail("unexpected", `\\${name} at ${i} needs a delimiter such as ( [ | . after it`, i);
          push(name === "left" ? "open" : "close", delim, i, k + m![1].length, true);
          i = k + m![1].length;
          continue;
        }
        if (name === "lvert" || name === "lbrace" || name === "lbrack") { push("open", name === "lvert" ? "|" : name === "lbrace" ? "{" : "[", i, j, name === "lvert"); i = j; continue; }
        if (name === "rvert" || name === "rbrace" || name === "rbrack") { push("close", name === "rvert" ? "|" : name === "rbrace" ? "}" : "]", i, j, name === "rvert"); i = j; continue; }
        if (name === "vert") { push("bar", "|", i, j); i = j; continue; }
        push("cmd", name, i, j);
        i = j;
        continue;
      }
      if (",;:!> ".includes(d)) { thin = true; i += 2; continue; }
      if (d === "{") { push("open", "{", i, i + 2); i += 2; continue; }
      if (d === "}") { push("close", "}", i, i + 2); i += 2; continue; }
      push("cmd", d, i, i + 2);
      i += 2;
      continue;
    }
    if (isLetter(c)) push("letter", c, i, i + 1);
    else if (isDigit(c)) push("digit", c, i, i + 1);
    else if (c === "{") push("lbrace", c, i, i + 1);
    else if (c === "}") push("rbrace", c, i, i + 1);
    else if (c === "(" || c === "[") push("open", c, i, i + 1);
    else if (c === ")" || c === "]") push("close", c, i, i + 1);
    else if (c === "|") push("bar", c, i, i + 1);
    else if (c === "~") thin = true;
    else if (c === "&" || c === "$") { /* alignment marks and math-mode dollars carry no meaning here */ }
    else if (ORDINARY_CHARS.includes(c)) push("char", c, i, i + 1);
    else if (UNICODE_COMMANDS[c]) push("cmd", UNICODE_COMMANDS[c], i, i + 1);
    else if (UNICODE_CHARS[c]) push("char", UNICODE_CHARS[c], i, i + 1);
    else fail("unexpected", `unexpected character '${c}' at ${i}`, i);
    i += 1;
  }
  tokens.push({ kind: "end", text: "", pos: n, end: n, sized: false, ws, thin });
  return { tokens, partner: matchBraces(tokens) };
}

function matchBraces(tokens: readonly LatexToken[]): Map<number, number> {
  const partner = new Map<number, number>();
  const open: number[] = [];
  tokens.forEach((t, index) => {
    if (t.kind === "lbrace") open.push(index);
    else if (t.kind === "rbrace") {
      const o = open.pop();
      if (o === undefined) fail("unbalanced", `unbalanced } at ${t.pos}`, t.pos);
      partner.set(o, index);
      partner.set(index, o);
    }
  });
  if (open.length > 0) {
    const first = tokens[open[open.length - 1]];
    fail("unbalanced", `unbalanced { at ${first.pos}`, first.pos);
  }
  return partner;
}
