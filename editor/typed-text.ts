import { Extension } from "@tiptap/core";
import { Plugin, PluginKey } from "@tiptap/pm/state";
import type { EditorView } from "@tiptap/pm/view";
import { caretInPlainText, takeBackTypedText, writeTypedTextInPlace } from "./typed-text-in-place";

export const typedTextKey = new PluginKey("typedText");

/** The part of a ProseMirror view that typing needs. */
export type TypingView = Pick<EditorView, "state" | "dispatch" | "editable" | "composing" | "someProp">;

/** A view in a browser, where a keystroke can be written in place. */
type ViewWithDom = TypingView & Pick<EditorView, "dom" | "posAtDOM" | "coordsAtPos" | "hasFocus" | "isDestroyed">;

const hasDom = (view: TypingView): view is ViewWithDom => typeof (view as Partial<ViewWithDom>).posAtDOM === "function" && Boolean((view as Partial<ViewWithDom>).dom?.ownerDocument);

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
  if (handled) return true;
  if (!typeInPlace(view, text)) view.dispatch(insert());
  return true;
}

/**
 * The common keystroke, a character typed into plain text, without a synchronous layout: the
 * DOM is written first (`writeTypedTextInPlace`), so ProseMirror's update finds nothing to
 * write and no caret to place, and the check that the caret is still on screen waits for
 * the frame, which lays the page out anyway. False when this keystroke cannot go that way.
 */
function typeInPlace(view: TypingView, text: string): boolean {
  if (!hasDom(view)) return false;
  const caret = caretInPlainText(view, view.state);
  if (!caret || !writeTypedTextInPlace(view, caret, text)) return false;
  const before = view.state.doc;
  try {
    view.dispatch(view.state.tr.insertText(text));
  } finally {
    if (view.state.doc.eq(before)) takeBackTypedText(view, caret, text);
  }
  keepCaretInViewAtNextFrame(view);
  return true;
}

const caretChecksPending = new WeakSet<object>();

/** Scrolls the caret into view, as `scrollIntoView()` on the transaction would, if the frame finds it off screen. */
function keepCaretInViewAtNextFrame(view: ViewWithDom): void {
  if (caretChecksPending.has(view) || typeof requestAnimationFrame !== "function") return;
  caretChecksPending.add(view);
  requestAnimationFrame(() => {
    caretChecksPending.delete(view);
    if (view.isDestroyed || !view.hasFocus()) return;
    const caret = view.coordsAtPos(view.state.selection.head);
    const visible = caret.top >= 0 && caret.bottom <= window.innerHeight && caret.left >= 0 && caret.right <= window.innerWidth;
    if (!visible) view.dispatch(view.state.tr.scrollIntoView());
  });
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
