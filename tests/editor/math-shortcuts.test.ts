import { describe, expect, it } from "vitest";
import { TextSelection } from "@tiptap/pm/state";
import { wrapLatexSelection } from "@/editor/math-shortcuts";
import { doc, headlessEditor, paragraph, step } from "./support/headless";

function inStep(relation: string, from: number, to: number) {
  const editor = headlessEditor(doc(step("st-a", relation)));
  return editor.state.apply(editor.state.tr.setSelection(TextSelection.create(editor.state.doc, 1 + from, 1 + to)));
}

describe("math entry shortcuts", () => {
  it("wraps the selection as a numerator and puts the caret in the denominator", () => {
    const tr = wrapLatexSelection(inStep("x = r_s", 4, 7), "\\frac{", "}{}", true)!;
    expect(tr.doc.textContent).toBe("x = \\frac{r_s}{}");
    expect(tr.selection.from - 1).toBe("x = \\frac{r_s}{".length);
  });

  it("inserts an empty slot with the caret inside when nothing is selected", () => {
    const tr = wrapLatexSelection(inStep("r", 1, 1), "^{", "}")!;
    expect(tr.doc.textContent).toBe("r^{}");
    expect(tr.selection.from - 1).toBe(3);
  });

  it("places the caret after a wrapped selection", () => {
    const tr = wrapLatexSelection(inStep("r s", 2, 3), "_{", "}")!;
    expect(tr.doc.textContent).toBe("r _{s}");
    expect(tr.selection.from - 1).toBe(6);
  });

  it("does nothing in prose", () => {
    const editor = headlessEditor(doc(paragraph({ type: "text", text: "prose" })));
    expect(wrapLatexSelection(editor.state, "\\frac{", "}{}")).toBeNull();
  });
});
