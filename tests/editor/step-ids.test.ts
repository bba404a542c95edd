import { describe, expect, it } from "vitest";
import { doc, headlessEditor, step } from "./support/headless";

function ids(editor: ReturnType<typeof headlessEditor>): string[] {
  const found: string[] = [];
  editor.state.doc.descendants((node) => {
    if (node.type.name === "step") found.push(node.attrs.id);
  });
  return found;
}

describe("step ids", () => {
  it("gives a step without an id a fresh one on the next change", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b")));
    editor.view.dispatch(editor.state.tr.insert(editor.state.doc.content.size, editor.schema.nodes.step.create()));
    const [, second] = ids(editor);
    expect(second).toMatch(/^st-[0-9a-z]{10}$/);
  });

  it("keeps the original's id when a copy is pasted above it", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b")));
    const copy = editor.state.doc.child(0);
    editor.view.dispatch(editor.state.tr.insert(0, copy));
    const [pasted, original] = ids(editor);
    expect(original).toBe("st-a");
    expect(pasted).not.toBe("st-a");
    expect(editor.state.doc.child(0).textContent).toBe("a=b");
  });

  it("does not touch ids when nothing is duplicated", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c")));
    editor.view.dispatch(editor.state.tr.insertText("x", 2));
    expect(ids(editor)).toEqual(["st-a", "st-b"]);
  });
});
