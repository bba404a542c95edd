import { describe, expect, it } from "vitest";
import { numberSteps, stepNumberingKey, stepNumberFromDecorations } from "@/editor/step-numbering";
import { blockPos, doc, headlessEditor, paragraph, step } from "./support/headless";

function refNumber(editor: ReturnType<typeof headlessEditor>): number | null {
  const decorations = stepNumberingKey.getState(editor.state)!.decorations;
  let found: number | null = null;
  editor.state.doc.descendants((node, pos) => {
    if (node.type.name === "stepRef") found = stepNumberFromDecorations(decorations.find(pos, pos + node.nodeSize));
  });
  return found;
}

describe("step numbering", () => {
  it("numbers steps 1, 2, 3 in document order, skipping prose", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), paragraph({ type: "text", text: "so" }), step("st-b", "b=c"), step("st-c", "c=d")));
    expect([...numberSteps(editor.state.doc)]).toEqual([["st-a", 1], ["st-b", 2], ["st-c", 3]]);
  });

  it("renumbers after a step is inserted above, and a citation shows the new number", () => {
    const editor = headlessEditor(
      doc(step("st-a", "a=b"), step("st-b", "b=c"), paragraph({ type: "text", text: "by " }, { type: "stepRef", attrs: { stepId: "st-b" } })),
    );
    expect(refNumber(editor)).toBe(2);
    editor.view.dispatch(editor.state.tr.insert(0, editor.schema.nodes.step.create({ id: "st-new" }, editor.schema.text("x=y"))));
    expect(stepNumberingKey.getState(editor.state)!.numbers.get("st-b")).toBe(3);
    expect(refNumber(editor)).toBe(3);
    // the citation itself still stores the id, not a number
    expect(JSON.stringify(editor.getJSON())).toContain('"stepId":"st-b"');
  });

  it("follows a step that moves, and reports a removed step as missing", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c"), paragraph({ type: "stepRef", attrs: { stepId: "st-a" } })));
    const first = editor.state.doc.child(0);
    // move step a below step b
    const tr = editor.state.tr.delete(0, first.nodeSize);
    tr.insert(editor.state.doc.child(1).nodeSize, first);
    editor.view.dispatch(tr);
    expect(refNumber(editor)).toBe(2);
    editor.view.dispatch(editor.state.tr.delete(blockPos(editor, 1), blockPos(editor, 2)));
    expect(refNumber(editor)).toBeNull();
  });
});
