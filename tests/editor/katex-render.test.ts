import { describe, expect, it } from "vitest";
import { renderLatex } from "@/editor/katex-render";

describe("renderLatex", () => {
  it("renders a well-formed formula without an error", () => {
    const { html, error } = renderLatex("V_{\\rm eff} = -\\frac{GM\\mu}{r}", true);
    expect(error).toBeNull();
    expect(html).toContain("katex-display");
  });

  it("returns the parse error instead of throwing", () => {
    const { html, error } = renderLatex("\\frac{r_s}{", false);
    expect(error).toMatch(/KaTeX parse error/);
    expect(html).toContain("katex-error");
  });

  it("does not honour commands that need trust", () => {
    const { html } = renderLatex("\\href{javascript:alert(1)}{x}", false);
    expect(html).not.toMatch(/<a\b|href=/); // the source may appear as text in the annotation, never as a link
  });

  it("keeps the MathML tree unless a visual-only copy is asked for", () => {
    expect(renderLatex("r_s", false).html).toContain("<math");
    const visual = renderLatex("r_s", false, { visualOnly: true });
    expect(visual.html).not.toContain("<math");
    expect(visual.html).toContain("katex-html");
    expect(renderLatex("\\frac{r_s}{", false, { visualOnly: true }).error).toMatch(/KaTeX parse error/);
  });
});
