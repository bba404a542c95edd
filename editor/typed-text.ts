import { Extension } from "@tiptap/core";
import { Plugin, PluginKey } from "@tiptap/pm/state";
import type { EditorView } from "@tiptap/pm/view";

export const typedTextKey = new PluginKey("typedText");

/** The part of a ProseMirror view that typing needs. */
export type TypingView = Pick<EditorView, "state" | "dispatch" | "editable" | "composing" | "someProp">;

/** A printable character typed on its own: no shortcut modifier, not part of an IME composition. */
export function plainTypedCharacter(view: Pick<EditorView, "composing">, event: KeyboardEvent): string | null {
  if (view.composing || event.isComposing || event.keyCode === 229) return null;
  // Ctrl+Alt is AltGr on some keyboards and types characters, as ProseMirror also allows
  if ((event.ctrlKey && !event.altKey) || event.metaKey) return null;
  if (!event.charCode) return null;
  const text = String.fromCharCode(event.charCode);
  return /[\r\n]/.test(text) ? null : text;
}

/**
 * Puts a typed character into the document as ProseMirror does for typing over a non-text
 * selection: the input rules (`handleTextInput`) see it first and may replace the insertion.
 * Returns false, touching nothing, for keys the browser should handle itself.
 */
export function typeCharacter(view: TypingView, event: KeyboardEvent): boolean {
  if (!view.editable) return false;
  const text = plainTypedCharacter(view, event);
  if (text === null) return false;
  const { from, to } = view.state.selection;
  const insert = () => view.state.tr.insertText(text).scrollIntoView();
  const handled = view.someProp("handleTextInput", (handle) => handle(view as EditorView, from, to, text, insert));
  if (!handled) view.dispatch(insert());
  return true;
}

/**
 * Typed characters go into the document as a transaction of ours instead of through the
 * browser's own text insertion. In a long notebook Chromium's insertion (its editing command,
 * selection sync and offset bookkeeping over the whole editing host) costs more than the rest of
 * a keystroke together; ProseMirror then only writes one text node and places the caret.
 *
 * Contract: the same path ProseMirror itself takes for typing over a non-text selection —
 * input rules (`handleTextInput`) still see every character and may replace the insertion;
 * IME composition, dead keys and shortcuts (Ctrl/Meta) are left to the browser.
 *
 * @example
 * // typing "x" in a step's source inserts "x" with one transaction, the browser inserts nothing
 */
export const TypedText = Extension.create({
  name: "typedText",

  addProseMirrorPlugins() {
    return [
      new Plugin({
        key: typedTextKey,
        props: {
          handleKeyPress: (view, event) => typeCharacter(view, event),
        },
      }),
    ];
  },
});
