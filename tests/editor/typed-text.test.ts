import { describe, expect, it } from "vitest";
import { TextSelection } from "@tiptap/pm/state";
import type { Editor } from "@tiptap/core";
import { typeCharacter, typedTextKey, type TypingView } from "@/editor/typed-text";
import { doc, headlessEditor, paragraph, step } from "./support/headless";

/** A keypress as the browser reports it; only the fields the handler reads. */
function keypress(char: string, extra: Partial<KeyboardEvent> = {}): KeyboardEvent {
  return { charCode: char.charCodeAt(0), keyCode: char.charCodeAt(0), ctrlKey: false, metaKey: false, altKey: false, isComposing: false, ...extra } as KeyboardEvent;
}

/**
 * The headless editor has no DOM view, so the handler gets the editor's state, dispatch and
 * plugin props the way ProseMirror's view hands them out (`someProp`: first truthy answer).
 * Typing in a real browser is covered by the end-to-end specs.
 */
function press(editor: Editor, event: KeyboardEvent, { editable = true, composing = false } = {}): boolean {
  const view = {
    get state() {
      return editor.state;
    },
    dispatch: (tr) => editor.view.dispatch(tr),
    editable,
    composing,
    someProp(name: string, f: (value: unknown) => unknown) {
      for (const plugin of editor.state.plugins) {
        const prop = (plugin.props as Record<string, unknown>)[name];
        if (typeof prop !== "function") continue;
        const result = f(prop.bind(plugin));
        if (result) return result;
      }
      return undefined;
    },
  } as TypingView;
  return typeCharacter(view, event);
}

/** An editor whose caret sits `offset` characters into the first block's text. */
function editorAt(content: ReturnType<typeof doc>, offset: number) {
  const editor = headlessEditor(content);
  editor.view.dispatch(editor.state.tr.setSelection(TextSelection.create(editor.state.doc, 1 + offset)));
  return editor;
}

describe("typed text goes in as our own transaction", () => {
  it("is installed in every notebook editor", () => {
    expect(typedTextKey.get(headlessEditor(doc(step("st-a", "x"))).state)).toBeDefined();
  });

  it("inserts a typed character at the caret of a step and takes the key from the browser", () => {
    const editor = editorAt(doc(step("st-a", "E = mc")), 6);
    expect(press(editor, keypress("^"))).toBe(true);
    expect(editor.state.doc.textContent).toBe("E = mc^");
    expect(editor.state.selection.from).toBe(1 + 7);
  });

  it("replaces a selection within one block, as the browser would", () => {
    const editor = headlessEditor(doc(step("st-a", "r_s = 2GM")));
    editor.view.dispatch(editor.state.tr.setSelection(TextSelection.create(editor.state.doc, 1, 4)));
    press(editor, keypress("R"));
    expect(editor.state.doc.textContent).toBe("R = 2GM");
  });

  it("still runs the input rules: `$r_s$` typed in prose becomes inline math", () => {
    const editor = editorAt(doc(paragraph({ type: "text", text: "radius $r_s" })), 11);
    press(editor, keypress("$"));
    const inline = editor.state.doc.firstChild!.lastChild!;
    expect(inline.type.name).toBe("mathInline");
    expect(inline.attrs.latex).toBe("r_s");
  });

  it("leaves shortcuts, Enter, IME composition and read-only notebooks to the browser", () => {
    const editor = editorAt(doc(step("st-a", "x")), 1);
    expect(press(editor, keypress("b", { ctrlKey: true }))).toBe(false);
    expect(press(editor, keypress("b", { metaKey: true }))).toBe(false);
    expect(press(editor, keypress("\r"))).toBe(false);
    expect(press(editor, keypress("a", { isComposing: true }))).toBe(false);
    expect(press(editor, keypress("a", { keyCode: 229 }))).toBe(false);
    expect(press(editor, keypress("a"), { composing: true })).toBe(false);
    expect(press(editor, keypress("a"), { editable: false })).toBe(false);
    expect(editor.state.doc.textContent).toBe("x");
  });

  it("types what AltGr (Ctrl+Alt) produces, as ProseMirror does", () => {
    const editor = editorAt(doc(step("st-a", "x")), 1);
    expect(press(editor, keypress("@", { ctrlKey: true, altKey: true }))).toBe(true);
    expect(editor.state.doc.textContent).toBe("x@");
  });
});
