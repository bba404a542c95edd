import katex from "katex";

export interface RenderedLatex {
  /** KaTeX HTML; when the source does not parse, KaTeX's own error rendering of the raw source. */
  readonly html: string;
  /** The parse error message, or null when the source rendered cleanly. */
  readonly error: string | null;
}

const ERROR_TITLE = /class="katex-error"[^>]*title="([^"]*)"/;

function decodeEntities(text: string): string {
  return text
    .replace(/&quot;/g, '"')
    .replace(/&#x27;|&#39;/g, "'")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&amp;/g, "&");
}

/**
 * Renders LaTeX with KaTeX in its safe mode (`trust: false`, `throwOnError: false`):
 * a malformed formula never throws, it comes back with its error message so the
 * editor can show it inline beside the source.
 *
 * @example
 * renderLatex("\\frac{r_s}{r}", false).error // null
 * renderLatex("\\frac{r_s}{", false).error   // "KaTeX parse error: …"
 * renderLatex("r_s", false, { visualOnly: true }).html // no <math> element: mark it aria-hidden
 */
export function renderLatex(latex: string, displayMode: boolean, { visualOnly = false }: { visualOnly?: boolean } = {}): RenderedLatex {
  const html = katex.renderToString(latex, {
    displayMode,
    trust: false,
    throwOnError: false,
    strict: "ignore",
    // visualOnly: for a copy whose source is read out beside it (the step's source line, an
    // outline entry's label); the MathML tree would double the DOM of a long notebook.
    output: visualOnly ? "html" : "htmlAndMathml",
  });
  const match = ERROR_TITLE.exec(html);
  return { html, error: match ? decodeEntities(match[1]) : null };
}
