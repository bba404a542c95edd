import { describe, expect, it } from "vitest";
import type { CheckAnswer } from "@/cas/check/protocol";
import { editedStepIds } from "@/editor/step-text-edit";
import { stepNumberingKey, stepNumberingFromDecorations } from "@/editor/step-numbering";
import { stepVerdictsKey, verdictFromDecorations } from "@/editor/step-verdicts";
import { blockPos, doc, headlessEditor, paragraph, step } from "./support/headless";

const verified: CheckAnswer = { verdict: "verified", method: { kind: "symbolic", detail: "expanded" } };

/** The numbering and verdict marks on each step, read back from the decorations a node view gets. */
function marks(editor: ReturnType<typeof headlessEditor>) {
  const numbering = stepNumberingKey.getState(editor.state)!.decorations;
  const verdicts = stepVerdictsKey.getState(editor.state)!.decorations;
  const found: { id: string; number: number | null; verdict: string | null }[] = [];
  editor.state.doc.descendants((node, pos) => {
    if (node.type.name !== "step") return true;
    const on = (set: typeof numbering) => set.find(pos, pos + node.nodeSize).filter((d) => d.from === pos && d.to === pos + node.nodeSize);
    const verdict = verdictFromDecorations(on(verdicts));
    found.push({ id: node.attrs.id, number: stepNumberingFromDecorations(on(numbering)).stepNumber, verdict: verdict?.state ?? null });
    return false;
  });
  return found;
}

describe("editedStepIds", () => {
  const threeSteps = () => headlessEditor(doc(step("st-a", "a=b"), paragraph({ type: "text", text: "so" }), step("st-b", "b=c"), step("st-c", "c=d")));

  it("names the step whose relation is typed in or deleted from", () => {
    const editor = threeSteps();
    const inB = blockPos(editor, 2) + 2;
    expect(editedStepIds(editor.state.tr.insertText("+0", inB))).toEqual(["st-b"]);
    expect(editedStepIds(editor.state.tr.delete(inB, inB + 1))).toEqual(["st-b"]);
    expect(editedStepIds(editor.state.tr.insertText("x", 2).insertText("y", blockPos(editor, 3) + 3))).toEqual(["st-a", "st-c"]);
  });

  it("is null for anything else: prose, a new block, an attribute, a step split or joined", () => {
    const editor = threeSteps();
    expect(editedStepIds(editor.state.tr.insertText("!", blockPos(editor, 1) + 1))).toBeNull();
    expect(editedStepIds(editor.state.tr.insert(0, editor.schema.nodes.step.create({ id: "st-new" })))).toBeNull();
    expect(editedStepIds(editor.state.tr.setNodeAttribute(0, "kind", "substitute"))).toBeNull();
    expect(editedStepIds(editor.state.tr.delete(blockPos(editor, 2) - 1, blockPos(editor, 2) + 1))).toBeNull();
  });
});

describe("numbers and verdict marks while typing", () => {
  it("keep the same numbering state and carry every mark to its step", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c"), step("st-c", "c=d")));
    editor.commands.setStepVerdicts([
      ["st-a", { state: "answered", answer: verified }],
      ["st-b", { state: "answered", answer: verified }],
      ["st-c", { state: "answered", answer: verified }],
    ]);
    const numbersBefore = stepNumberingKey.getState(editor.state)!.numbers;
    editor.view.dispatch(editor.state.tr.insertText("+0", blockPos(editor, 1) + 4));
    expect(stepNumberingKey.getState(editor.state)!.numbers).toBe(numbersBefore);
    expect(marks(editor)).toEqual([
      { id: "st-a", number: 1, verdict: "answered" },
      { id: "st-b", number: 2, verdict: "pending" },
      { id: "st-c", number: 3, verdict: "answered" },
    ]);
    // a second keystroke changes no verdict: the verdict state is kept as it is
    const verdictsBefore = stepVerdictsKey.getState(editor.state)!.verdicts;
    editor.view.dispatch(editor.state.tr.insertText("+0", blockPos(editor, 1) + 6));
    expect(stepVerdictsKey.getState(editor.state)!.verdicts).toBe(verdictsBefore);
    expect(marks(editor).map((m) => m.number)).toEqual([1, 2, 3]);
    expect(editor.state.doc.child(1).textContent).toBe("b=c+0+0");
  });

  it("rebuild them when a step is added", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c")));
    editor.view.dispatch(editor.state.tr.insert(0, editor.schema.nodes.step.create({ id: "st-new" }, editor.schema.text("x=y"))));
    expect(marks(editor)).toEqual([
      { id: "st-new", number: 1, verdict: "pending" },
      { id: "st-a", number: 2, verdict: null },
      { id: "st-b", number: 3, verdict: null },
    ]);
  });
});
