import { Extension, type JSONContent } from "@tiptap/core";
import { Plugin, PluginKey } from "@tiptap/pm/state";
import { newStepId } from "./step-id";

export const latexPasteKey = new PluginKey("latexPaste");

const DISPLAY_MATH =
  /\\begin\{(equation\*?|align\*?|aligned|eqnarray\*?|gather\*?|multline\*?|split)\}([\s\S]*?)\\end\{\1\}|\$\$([\s\S]+?)\$\$|\\\[([\s\S]+?)\\\]/g;
const MULTI_LINE = /^(align|aligned|eqnarray|gather|split)/;
const RELATION = /(?:^|[^\\<>!])(?:=|<|>)|\\(?:le|ge|leq|geq|approx|simeq|equiv|neq|sim)\b/;

/** Removes what a paper's source carries that a relation does not need. */
function cleanFormula(latex: string): string {
  return latex
    .replace(/(^|[^\\])%.*$/gm, "$1") // TeX comments
    .replace(/\\(label|tag)\*?\{[^}]*\}/g, "")
    .replace(/\\(nonumber|notag)\b/g, "")
    .replace(/\s+/g, " ")
    .replace(/\s*[,.;]\s*$/, "") // sentence punctuation after a display formula
    .trim();
}

/** Splits at top-level `\\` (row breaks), ignoring ones inside braces. */
function splitRows(body: string): string[] {
  const rows: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i < body.length; i++) {
    const ch = body[i];
    if (ch === "\\" && body[i + 1] === "\\" && depth === 0) {
      rows.push(body.slice(start, i));
      start = i + 2;
      i += 1;
      continue;
    }
    if (ch === "\\") { i += 1; continue; } // skip an escaped character such as \{ or \&
    if (ch === "{") depth += 1;
    if (ch === "}") depth = Math.max(0, depth - 1);
  }
  rows.push(body.slice(start));
  return rows.map((row) => row.replace(/^\s*\[[^\]]*\]/, "")); // drop `\\[2pt]` spacing
}

/**
 * Turns the rows of an `align` into relations: alignment `&`s go, and a row that starts with
 * its relation sign (`&= …`) borrows the left-hand side of the row above, as a reader would.
 */
function alignRows(body: string): string[] {
  const relations: string[] = [];
  let lhs = "";
  for (const row of splitRows(body)) {
    const text = cleanFormula(row.replace(/(^|[^\\])&/g, "$1 "));
    if (!text) continue;
    const continuation = /^(=|<|>|\\approx|\\simeq|\\equiv|\\le|\\ge)/.test(text);
    if (continuation && lhs) relations.push(`${lhs} ${text}`);
    else {
      relations.push(text);
      const sign = text.search(/=|\\approx|\\simeq|\\equiv/);
      lhs = sign > 0 ? text.slice(0, sign).trim() : "";
    }
  }
  return relations;
}

function formulaBlock(latex: string): JSONContent {
  const content = latex ? [{ type: "text", text: latex }] : [];
  return RELATION.test(latex)
    ? { type: "step", attrs: { id: newStepId(), kind: "algebra", detail: "", cites: [] }, content }
    : { type: "mathDisplay", content };
}

/** Prose between formulas: paragraphs at blank lines, `$…$` as inline math. */
function proseBlocks(text: string): JSONContent[] {
  return text
    .split(/\n\s*\n/)
    .map((paragraph) => paragraph.replace(/\s+/g, " ").trim())
    .filter(Boolean)
    .map((paragraph) => {
      const content: JSONContent[] = [];
      let last = 0;
      for (const match of paragraph.matchAll(/\$([^$]+)\$/g)) {
        if (match.index > last) content.push({ type: "text", text: paragraph.slice(last, match.index) });
        content.push({ type: "mathInline", attrs: { latex: match[1].trim() } });
        last = match.index + match[0].length;
      }
      if (last < paragraph.length) content.push({ type: "text", text: paragraph.slice(last) });
      return { type: "paragraph", content };
    });
}

/**
 * Converts LaTeX copied from a paper into notebook blocks: every `equation`, `$$…$$` and
 * `\[…\]` becomes one block, every row of an `align` (or `eqnarray`, `gather`) its own block;
 * a block that is a relation (has =, <, >, \approx, …) becomes a step (justification
 * "algebra", to be set by the author), anything else display math. Labels, tags, `\nonumber`,
 * comments and trailing punctuation are dropped; prose around the formulas is kept as
 * paragraphs. Returns null when the text holds no display math, so ordinary paste proceeds.
 *
 * @example
 * latexToBlocks("\\begin{align} V &= a \\\\ &= b \\end{align}")
 * // [step "V = a", step "V = b"]
 */
export function latexToBlocks(text: string): JSONContent[] | null {
  const blocks: JSONContent[] = [];
  let last = 0;
  let found = false;
  for (const match of text.matchAll(DISPLAY_MATH)) {
    found = true;
    blocks.push(...proseBlocks(text.slice(last, match.index)));
    const [, environment, envBody, dollars, brackets] = match;
    if (environment && MULTI_LINE.test(environment)) blocks.push(...alignRows(envBody).map(formulaBlock));
    else {
      const body = envBody ?? dollars ?? brackets ?? "";
      // `equation` wrapping `split`/`aligned` is still one formula per row
      const inner = /\\begin\{(split|aligned)\}([\s\S]*?)\\end\{\1\}/.exec(body);
      if (inner) blocks.push(...alignRows(inner[2]).map(formulaBlock));
      else blocks.push(formulaBlock(cleanFormula(body)));
    }
    last = match.index + match[0].length;
  }
  if (!found) return null;
  blocks.push(...proseBlocks(text.slice(last)));
  return blocks;
}

/**
 * Paste handler: plain-text LaTeX with display math becomes display math and steps
 * (see `latexToBlocks`). Pastes into a LaTeX source (a step or display formula) and pastes
 * that carry our own HTML are left to the default handling.
 *
 * @example
 * // pasting "\\[ E = \\mu c^2 \\dot t \\]" into prose inserts a step
 */
export const LatexPaste = Extension.create({
  name: "latexPaste",

  addProseMirrorPlugins() {
    const editor = this.editor;
    return [
      new Plugin({
        key: latexPasteKey,
        props: {
          handlePaste: (view, event) => {
            const data = event.clipboardData;
            if (!data || !view.editable) return false;
            if (data.getData("text/html").includes("data-type=")) return false;
            if (view.state.selection.$from.parent.type.spec.code) return false;
            const blocks = latexToBlocks(data.getData("text/plain"));
            if (!blocks) return false;
            return editor.commands.insertContent(blocks);
          },
        },
      }),
    ];
  },
});
