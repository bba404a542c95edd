"use client";

import { renderLatex } from "@/editor/katex-render";

/** One relation rendered with KaTeX (safe mode); the source is kept as its accessible label. */
export function TexLine({ latex }: { latex: string }) {
  const { html } = renderLatex(latex, false);
  return <span role="math" aria-label={latex} dangerouslySetInnerHTML={{ __html: html }} />;
}
