import { describe, expect, it } from "vitest";
import { TextSelection } from "@tiptap/pm/state";
import type { Editor } from "@tiptap/core";
import { caretInPlainText, takeBackTypedText, writeTypedTextInPlace, type CaretInText, type InPlaceView } from "@/editor/typed-text-in-place";
import { doc, headlessEditor, paragraph, step } from "./support/headless";

const TEXT_NODE = 3;

/**
 * A DOM text node as far as writing in place uses it. The caret's move is the DOM standard's
 * "replace data" rule for live ranges (https://dom.spec.whatwg.org/#concept-cd-replace), which
 * browsers apply to the selection; the end-to-end editor spec checks it in Chromium.
 */
class FakeText {
  readonly nodeType = TEXT_NODE;
  caret: number;
  constructor(public data: string, caret: number) {
    this.caret = caret;
  }
  private replace(offset: number, count: number, text: string) {
    this.data = this.data.slice(0, offset) + text + this.data.slice(offset + count);
    if (this.caret > offset && this.caret <= offset + count) this.caret = offset;
    else if (this.caret > offset + count) this.caret += text.length - count;
  }
  insertData(offset: number, text: string) {
    this.replace(offset, 0, text);
  }
  deleteData(offset: number, count: number) {
    this.replace(offset, count, "");
  }
}

/** A view whose DOM selection is a collapsed caret in `node`, mapped to document position `pos`. */
function viewOver(node: FakeText, pos: number, { anchorOffset = node.caret } = {}): InPlaceView & { paused: number; domObserver: { stopped(f: () => void): void } } {
  const selection = { focusNode: node, focusOffset: node.caret, anchorNode: node, anchorOffset };
  const start = pos - node.caret; // where the text node starts in the document
  const view = {
    dom: { ownerDocument: { getSelection: () => selection } },
    posAtDOM: (target: unknown, offset: number) => (target === node ? start + offset : -1),
    paused: 0,
    domObserver: {
      stopped(f: () => void) {
        view.paused += 1;
        f();
      },
    },
  };
  return view as unknown as InPlaceView & { paused: number; domObserver: { stopped(f: () => void): void } };
}

function caretAt(editor: Editor, pos: number) {
  editor.view.dispatch(editor.state.tr.setSelection(TextSelection.create(editor.state.doc, pos)));
  return editor.state;
}

describe("a typed character written straight into the DOM", () => {
  it("finds the caret in a step's relation when DOM text and caret match the document", () => {
    const state = caretAt(headlessEditor(doc(step("st-a", "E = mc"))), 1 + 6);
    const node = new FakeText("E = mc", 6);
    expect(caretInPlainText(viewOver(node, 7), state)).toEqual({ node, offset: 6 });
  });

  it("goes the ordinary way at the start of a block, with marks, a stale DOM, a selection or another node", () => {
    const editor = headlessEditor(doc(step("st-a", "E = mc")));
    expect(caretInPlainText(viewOver(new FakeText("E = mc", 0), 1), caretAt(editor, 1))).toBeNull();
    const state = caretAt(editor, 7);
    expect(caretInPlainText(viewOver(new FakeText("E = m", 5), 7), state)).toBeNull(); // DOM behind the document
    expect(caretInPlainText(viewOver(new FakeText("E = mc", 6), 8), state)).toBeNull(); // the node is not this block's
    expect(caretInPlainText(viewOver(new FakeText("E = mc", 6), 7, { anchorOffset: 2 }), state)).toBeNull();

    const bold = headlessEditor(doc(paragraph({ type: "text", text: "the ", marks: [] }, { type: "text", text: "radius", marks: [{ type: "bold" }] })));
    expect(caretInPlainText(viewOver(new FakeText("radius", 3), 8), caretAt(bold, 8))).toBeNull();
  });

  it("inserts the text with the caret after it, with ProseMirror's observer paused", () => {
    const node = new FakeText("ab", 2);
    const view = viewOver(node, 3);
    const caret: CaretInText = { node: node as unknown as Text, offset: 2 };
    expect(writeTypedTextInPlace(view, caret, "c")).toBe(true);
    expect([node.data, node.caret, view.paused]).toEqual(["abc", 3, 1]);

    const middle = new FakeText("r^3}", 2);
    writeTypedTextInPlace(viewOver(middle, 3), { node: middle as unknown as Text, offset: 2 }, "+0");
    expect([middle.data, middle.caret]).toEqual(["r^+03}", 4]);
  });

  it("takes the text back, caret and all, when the document did not take it", () => {
    const node = new FakeText("ab", 2);
    const view = viewOver(node, 3);
    const caret: CaretInText = { node: node as unknown as Text, offset: 2 };
    writeTypedTextInPlace(view, caret, "c");
    takeBackTypedText(view, caret, "c");
    expect([node.data, node.caret, view.paused]).toEqual(["ab", 2, 2]);
    takeBackTypedText(view, caret, "c"); // nothing of it left to take back
    expect(node.data).toBe("ab");
  });

  it("does nothing when ProseMirror's observer cannot be reached", () => {
    const node = new FakeText("ab", 2);
    expect(writeTypedTextInPlace({}, { node: node as unknown as Text, offset: 2 }, "c")).toBe(false);
    expect(node.data).toBe("ab");
  });
});
