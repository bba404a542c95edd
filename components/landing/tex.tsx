import katex from "katex";

/** Server-rendered KaTeX; `trust: false` so no TeX command can reach outside the formula. */
export function Tex({ source, display = false }: { source: string; display?: boolean }) {
  const html = katex.renderToString(source, { displayMode: display, throwOnError: false, trust: false, output: "htmlAndMathml" });
  return <span dangerouslySetInnerHTML={{ __html: html }} />;
}
