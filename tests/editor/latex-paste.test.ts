import { describe, expect, it } from "vitest";
import { latexToBlocks } from "@/editor/latex-paste";
import { nodeFromJSON } from "./support/html-spec";

const relations = (blocks: ReturnType<typeof latexToBlocks>) =>
  (blocks ?? []).map((b) => ({ type: b.type, text: b.content?.map((c) => c.text ?? "").join("") ?? "" }));

describe("LaTeX paste", () => {
  it("leaves text without display math to the ordinary paste", () => {
    expect(latexToBlocks("The orbit is bound when $E < \\mu c^2$.")).toBeNull();
  });

  it("turns an equation environment into a step, dropping label and punctuation", () => {
    const blocks = latexToBlocks("\\begin{equation}\\label{eq:E}\n  E = \\mu c^2\\left(1-\\frac{r_s}{r}\\right)\\dot t ,\n\\end{equation}");
    expect(relations(blocks)).toEqual([{ type: "step", text: "E = \\mu c^2\\left(1-\\frac{r_s}{r}\\right)\\dot t" }]);
    expect(blocks![0].attrs?.id).toMatch(/^st-/);
    expect(blocks![0].attrs?.kind).toBe("algebra");
  });

  it("makes one step per align row, borrowing the left side for rows that start with &=", () => {
    const blocks = latexToBlocks(
      "\\begin{align}\n V_{\\rm eff} &= -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} \\nonumber\\\\\n &= -\\frac{GM\\mu}{r}\\left(1 - \\frac{L^2}{2GM\\mu^2 r}\\right) \\label{eq:V}\n\\end{align}",
    );
    expect(relations(blocks)).toEqual([
      { type: "step", text: "V_{\\rm eff} = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2}" },
      { type: "step", text: "V_{\\rm eff} = -\\frac{GM\\mu}{r}\\left(1 - \\frac{L^2}{2GM\\mu^2 r}\\right)" },
    ]);
  });

  it("does not split at \\\\ inside braces or treat \\& as alignment", () => {
    const blocks = latexToBlocks("\\begin{align} a &= \\text{x \\& y} \\\\ b &= \\frac{1}{\\substack{p\\\\q}} \\end{align}");
    expect(relations(blocks).map((r) => r.text)).toEqual(["a = \\text{x \\& y}", "b = \\frac{1}{\\substack{p\\\\q}}"]);
  });

  it("reads $$…$$ and \\[…\\], and keeps an expression without a relation as display math", () => {
    const blocks = latexToBlocks("$$ r_{\\rm ISCO} = 3 r_s $$ and \\[ \\int_0^\\infty e^{-x}\\,dx \\]");
    expect(relations(blocks)).toEqual([
      { type: "step", text: "r_{\\rm ISCO} = 3 r_s" },
      { type: "paragraph", text: "and" },
      { type: "mathDisplay", text: "\\int_0^\\infty e^{-x}\\,dx" },
    ]);
  });

  it("keeps prose around the formulas, with $…$ as inline math", () => {
    const blocks = latexToBlocks("For $r > r_s$ we find\n\\[ \\dot r^2 = 0 \\]\nwhich is circular.");
    expect(blocks![0]).toEqual({
      type: "paragraph",
      content: [{ type: "text", text: "For " }, { type: "mathInline", attrs: { latex: "r > r_s" } }, { type: "text", text: " we find" }],
    });
    expect(blocks!.at(-1)).toEqual({ type: "paragraph", content: [{ type: "text", text: "which is circular." }] });
  });

  it("treats an equation wrapping split as one step per row", () => {
    const blocks = latexToBlocks("\\begin{equation}\\begin{split} f &= a+b \\\\ &= c \\end{split}\\end{equation}");
    expect(relations(blocks).map((r) => r.text)).toEqual(["f = a+b", "f = c"]);
  });

  it("produces blocks the notebook schema accepts", () => {
    const blocks = latexToBlocks("Text $x$.\n\\begin{align} a&=b\\\\&=c \\end{align}\n$$ x^2 $$")!;
    expect(() => nodeFromJSON({ type: "doc", content: blocks }).check()).not.toThrow();
  });
});
