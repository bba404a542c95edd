import type { JSONContent } from "@tiptap/core";
import { extractDerivation } from "./derivation";
import type { JustificationKind } from "./step";

export interface LatexExportOptions {
  readonly title: string;
  /** Shown as the author line (the group's name). */
  readonly author?: string;
  /** Shown as the date line, e.g. "Edition 2, published 2031-04-02". */
  readonly date?: string;
  /** A note under the title, e.g. the edition's SHA-256. */
  readonly note?: string;
  /** attachment id → path of the figure file inside the export (e.g. "figures/ab12….png"). */
  readonly figures?: ReadonlyMap<string, string>;
  /** step id → verdict text from an edition's check ledger, printed with the justification. */
  readonly verdicts?: ReadonlyMap<string, string>;
}

export interface LatexExport {
  readonly tex: string;
  /** Attachment ids of the figures the document places (embedded or not). */
  readonly figureIds: readonly string[];
}

// pdflatex reads UTF-8 through inputenc, which knows Latin-1 accents but not Greek or
// mathematical symbols: those are written as commands, in text and in math alike.
const MATH_SYMBOLS: Record<string, string> = {
  α: "\\alpha", β: "\\beta", γ: "\\gamma", δ: "\\delta", ε: "\\epsilon", ζ: "\\zeta", η: "\\eta", θ: "\\theta",
  ι: "\\iota", κ: "\\kappa", λ: "\\lambda", μ: "\\mu", ν: "\\nu", ξ: "\\xi", π: "\\pi", ρ: "\\rho", σ: "\\sigma",
  τ: "\\tau", υ: "\\upsilon", φ: "\\phi", ϕ: "\\phi", χ: "\\chi", ψ: "\\psi", ω: "\\omega", Γ: "\\Gamma", Δ: "\\Delta",
  Θ: "\\Theta", Λ: "\\Lambda", Ξ: "\\Xi", Π: "\\Pi", Σ: "\\Sigma", Φ: "\\Phi", Ψ: "\\Psi", Ω: "\\Omega",
  "−": "-", "∞": "\\infty", "→": "\\to", "←": "\\leftarrow", "≈": "\\approx", "≤": "\\le", "≥": "\\ge", "≠": "\\ne",
  "×": "\\times", "·": "\\cdot", "±": "\\pm", "∂": "\\partial", "∇": "\\nabla", "′": "'", "∝": "\\propto", "∼": "\\sim",
  "⊙": "\\odot", "∈": "\\in", "√": "\\surd", "∫": "\\int", "∑": "\\sum", "⟨": "\\langle", "⟩": "\\rangle", "ℓ": "\\ell",
  "ṙ": "\\dot r", "ṫ": "\\dot t",
};
const TEXT_SYMBOLS: Record<string, string> = {
  "—": "---", "–": "--", "‘": "`", "’": "'", "“": "``", "”": "''", "…": "\\dots{}", "•": "\\textbullet{}",
};

function codePoint(char: string): string {
  return `[U+${char.codePointAt(0)!.toString(16).toUpperCase().padStart(4, "0")}]`;
}

/** Is this character one pdflatex's utf8 input reads without help (ASCII and Latin-1)? */
const latin1 = (char: string) => char.codePointAt(0)! < 0x100;

/**
 * Escapes prose for LaTeX: special characters, typographic punctuation, and Greek and math
 * symbols as inline math; anything pdflatex cannot read becomes its code point in brackets.
 *
 * @example
 * escapeText("r_s ≈ 18 km & 50%") // "r\\_s $\\approx$ 18 km \\& 50\\%"
 */
export function escapeText(text: string): string {
  let out = "";
  for (const char of text) {
    if (char === "\\") out += "\\textbackslash{}";
    else if ("{}$&%#_".includes(char)) out += `\\${char}`;
    else if (char === "^") out += "\\textasciicircum{}";
    else if (char === "~") out += "\\textasciitilde{}";
    else if (char === "<" || char === ">") out += `$${char}$`;
    else if (TEXT_SYMBOLS[char]) out += TEXT_SYMBOLS[char];
    else if (MATH_SYMBOLS[char]) out += `$${MATH_SYMBOLS[char]}$`;
    else if (char === "\u00a0") out += "~";
    else if (latin1(char)) out += char;
    else out += codePoint(char);
  }
  return out;
}

/**
 * Makes a formula written for KaTeX safe for pdflatex's math mode: Unicode symbols become
 * commands, and `%`, `#`, `&` (comment, parameter, alignment in LaTeX) are escaped.
 *
 * @example
 * sanitizeMath("E ≈ μc^2 % rest") // "E \\approx  \\mu c^2 \\% rest"
 */
export function sanitizeMath(latex: string): string {
  let out = "";
  let previousEscape = false;
  for (const char of latex) {
    if (!previousEscape && "%#&".includes(char)) out += `\\${char}`;
    else if (MATH_SYMBOLS[char]) out += ` ${MATH_SYMBOLS[char]} `;
    else if (char === "\u00a0") out += "~";
    else if (char.codePointAt(0)! < 0x80) out += char;
    else out += `\\text{${escapeText(char)}}`;
    previousEscape = char === "\\" && !previousEscape;
  }
  return out.trim();
}

/** A label usable in \label and \ref (letters, digits and hyphens). */
export function stepLabel(stepId: string): string {
  return `step:${stepId.replace(/[^A-Za-z0-9-]/g, "-")}`;
}

const JUSTIFICATION_WORDS: Record<JustificationKind, string> = {
  algebra: "algebra",
  substitute: "substitute",
  differentiate: "differentiate by",
  "euler-lagrange": "Euler--Lagrange equation in",
  limit: "limit",
  definition: "definition",
};

function justificationLine(attrs: Record<string, unknown>, known: ReadonlySet<string>, verdict: string | undefined): string {
  const kind = (typeof attrs.kind === "string" && attrs.kind in JUSTIFICATION_WORDS ? attrs.kind : "algebra") as JustificationKind;
  let detail = typeof attrs.detail === "string" ? attrs.detail.trim() : "";
  if (kind === "differentiate") detail = detail.replace(/^by\s+/i, "");
  if (kind === "euler-lagrange") detail = detail.replace(/^in\s+/i, "");
  const parts = detail
    .split(/;|\n/)
    .map((piece) => piece.trim())
    .filter(Boolean)
    .map((piece) => `$${sanitizeMath(piece)}$`);
  let line = JUSTIFICATION_WORDS[kind] + (parts.length ? ` ${parts.join(", ")}` : "");
  const cites = Array.isArray(attrs.cites) ? attrs.cites.filter((c): c is string => typeof c === "string") : [];
  const refs = cites.map((id) => (known.has(id) ? `(\\ref{${stepLabel(id)}})` : "(step removed)"));
  if (refs.length) line += `; using ${refs.join(", ")}`;
  if (typeof attrs.follows === "string" && attrs.follows) {
    line += `; from ${known.has(attrs.follows) ? `(\\ref{${stepLabel(attrs.follows)}})` : "(step removed)"}`;
  }
  if (verdict) line += ` --- \\emph{${escapeText(verdict)}}`;
  return `\\vbjustification{${line}}`;
}

function inline(nodes: readonly JSONContent[] | undefined, known: ReadonlySet<string>): string {
  return (nodes ?? [])
    .map((node) => {
      switch (node.type) {
        case "text":
          return applyMarks(escapeText(node.text ?? ""), node.marks ?? []);
        case "mathInline": {
          const latex = typeof node.attrs?.latex === "string" ? node.attrs.latex.trim() : "";
          return latex ? `$${sanitizeMath(latex)}$` : "";
        }
        case "stepRef": {
          const id = typeof node.attrs?.stepId === "string" ? node.attrs.stepId : "";
          return known.has(id) ? `(\\ref{${stepLabel(id)}})` : "(step removed)";
        }
        case "hardBreak":
          return "\\newline{}";
        default:
          return inline(node.content, known);
      }
    })
    .join("");
}

function applyMarks(text: string, marks: readonly { type: string; attrs?: Record<string, unknown> }[]): string {
  return marks.reduce((inner, mark) => {
    switch (mark.type) {
      case "bold":
        return `\\textbf{${inner}}`;
      case "italic":
        return `\\emph{${inner}}`;
      case "code":
        return `\\texttt{${inner}}`;
      case "underline":
        return `\\underline{${inner}}`;
      case "link":
        return typeof mark.attrs?.href === "string" ? `${inner}\\footnote{\\texttt{${escapeText(mark.attrs.href)}}}` : inner;
      default:
        return inner; // strike-through and anything unknown: the words stay, the styling goes
    }
  }, text);
}

function symbolsList(label: string, value: unknown): string | null {
  if (!Array.isArray(value) || value.length === 0) return null;
  const items = value
    .filter((s): s is { symbol: string; dimension?: string; note?: string } => typeof s?.symbol === "string" && s.symbol.trim() !== "")
    .map((s) => {
      const about = [s.dimension, s.note].filter((x): x is string => typeof x === "string" && x.trim() !== "").map(escapeText).join("; ");
      return `$${sanitizeMath(s.symbol)}$${about ? ` (${about})` : ""}`;
    });
  return items.length ? `\\item ${label}: ${items.join(", ")}` : null;
}

function spacetimeBlock(attrs: Record<string, unknown>): string {
  const name = typeof attrs.name === "string" && attrs.name.trim() ? attrs.name.trim() : "Spacetime";
  const lineElement = typeof attrs.lineElement === "string" ? attrs.lineElement.trim() : "";
  const assumptions = Array.isArray(attrs.assumptions) ? attrs.assumptions.filter((a): a is string => typeof a === "string" && a.trim() !== "") : [];
  const parameter = typeof attrs.parameter === "string" && attrs.parameter.trim() ? attrs.parameter : "\\tau";
  const items = [
    symbolsList("Coordinates", attrs.coordinates),
    symbolsList("Constants", attrs.constants),
    assumptions.length ? `\\item Assumptions: ${assumptions.map((a) => `$${sanitizeMath(a)}$`).join(", ")}` : null,
    `\\item Curve parameter: $${sanitizeMath(parameter)}$`,
  ].filter((x): x is string => x !== null);
  return [
    `\\paragraph{Spacetime: ${escapeText(name)}.}`,
    lineElement ? `\\begin{equation*}\n${sanitizeMath(lineElement)}\n\\end{equation*}` : "",
    `\\begin{itemize}\n${items.join("\n")}\n\\end{itemize}`,
  ]
    .filter(Boolean)
    .join("\n");
}

function figure(attrs: Record<string, unknown>, files: ReadonlyMap<string, string>): string {
  const id = typeof attrs.attachmentId === "string" ? attrs.attachmentId : "";
  const caption = typeof attrs.caption === "string" ? attrs.caption.trim() : "";
  const file = files.get(id);
  const body = file
    ? `\\includegraphics[width=0.8\\linewidth,height=0.4\\textheight,keepaspectratio]{${file}}`
    : "\\fbox{\\parbox{0.6\\linewidth}{\\centering Figure not included in this export.}}";
  return `\\begin{figure}[htbp]\n\\centering\n${body}\n${caption ? `\\caption{${escapeText(caption)}}\n` : ""}\\end{figure}`;
}

function blocks(nodes: readonly JSONContent[] | undefined, context: Context): string[] {
  return (nodes ?? []).flatMap((node) => block(node, context));
}

interface Context {
  readonly known: ReadonlySet<string>;
  readonly files: ReadonlyMap<string, string>;
  readonly verdicts: ReadonlyMap<string, string>;
  readonly figureIds: string[];
}

function block(node: JSONContent, context: Context): string[] {
  const attrs = (node.attrs ?? {}) as Record<string, unknown>;
  switch (node.type) {
    case "heading": {
      const command = attrs.level === 3 ? "subsection" : "section";
      const text = inline(node.content, context.known).trim();
      return text ? [`\\${command}{${text}}`] : [];
    }
    case "paragraph": {
      const text = inline(node.content, context.known).trim();
      return text ? [text] : [];
    }
    case "mathDisplay": {
      const latex = (node.content ?? []).map((t) => t.text ?? "").join("").trim();
      return latex ? [`\\begin{equation*}\n${sanitizeMath(latex)}\n\\end{equation*}`] : [];
    }
    case "step": {
      const id = typeof attrs.id === "string" ? attrs.id : "";
      const relation = (node.content ?? []).map((t) => t.text ?? "").join("").trim();
      const label = id && context.known.has(id) ? `\\label{${stepLabel(id)}}` : "";
      return [
        `\\begin{equation}${label}\n${relation ? sanitizeMath(relation) : "\\text{(empty step)}"}\n\\end{equation}\n${justificationLine(attrs, context.known, context.verdicts.get(id))}`,
      ];
    }
    case "spacetimeBlock":
      return [spacetimeBlock(attrs)];
    case "figure": {
      if (typeof attrs.attachmentId === "string") context.figureIds.push(attrs.attachmentId);
      return [figure(attrs, context.files)];
    }
    case "bulletList":
    case "orderedList": {
      const env = node.type === "bulletList" ? "itemize" : "enumerate";
      const items = (node.content ?? []).map((item) => `\\item ${blocks(item.content, context).join("\n\n")}`);
      return items.length ? [`\\begin{${env}}\n${items.join("\n")}\n\\end{${env}}`] : [];
    }
    case "blockquote":
      return [`\\begin{quote}\n${blocks(node.content, context).join("\n\n")}\n\\end{quote}`];
    case "codeBlock": {
      const code = (node.content ?? []).map((t) => t.text ?? "").join("").replace(/\\end\{verbatim\}/g, "\\end {verbatim}");
      return [`\\begin{verbatim}\n${[...code].map((c) => (latin1(c) ? c : codePoint(c))).join("")}\n\\end{verbatim}`];
    }
    case "horizontalRule":
      return ["\\par\\noindent\\rule{\\linewidth}{0.4pt}"];
    default:
      return blocks(node.content, context);
  }
}

/**
 * Writes a notebook as a standalone LaTeX article for pdflatex (amsmath, amssymb, graphicx):
 * headings become sections, each step a numbered equation labelled by its id and followed by
 * its justification (and, for an edition, its verdict), the spacetime block a displayed line
 * element with a list of its declarations, figures `\includegraphics` of the files named in
 * `figures`. Remarks are not part of the document, so never exported.
 *
 * @example
 * const { tex } = exportLatex(doc, { title: "Kestrel-7 orbits", author: "Strong-Field Orbits" });
 * tex.includes("\\begin{equation}\\label{step:ks05}") // true
 */
export function exportLatex(doc: JSONContent, options: LatexExportOptions): LatexExport {
  const known = new Set(extractDerivation(doc).steps.map((s) => s.id));
  const context: Context = { known, files: options.figures ?? new Map(), verdicts: options.verdicts ?? new Map(), figureIds: [] };
  const body = blocks(doc.content, context).join("\n\n");
  const tex = [
    "% Exported from Vierbein. Compile with: pdflatex <this file>",
    "\\documentclass[11pt]{article}",
    "\\usepackage[utf8]{inputenc}",
    "\\usepackage{amsmath,amssymb}",
    "\\usepackage{graphicx}",
    "% Steps are the only numbered equations, so (n) here is step n in the notebook.",
    "% A step's justification, set flush right under its equation.",
    "\\newcommand{\\vbjustification}[1]{\\par\\nopagebreak\\noindent\\hfill{\\small\\textit{#1}}\\par\\medskip}",
    `\\title{${escapeText(options.title)}}`,
    `\\author{${escapeText(options.author ?? "")}}`,
    `\\date{${escapeText(options.date ?? "")}${options.note ? `\\\\[0.5ex]{\\small ${escapeText(options.note)}}` : ""}}`,
    "\\begin{document}",
    "\\maketitle",
    "",
    body,
    "",
    "\\end{document}",
    "",
  ].join("\n");
  return { tex, figureIds: context.figureIds };
}
