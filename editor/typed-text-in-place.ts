import { TextSelection, type EditorState } from "@tiptap/pm/state";
import type { EditorView } from "@tiptap/pm/view";

/** The part of a ProseMirror view that writing in place needs. */
export type InPlaceView = Pick<EditorView, "dom" | "posAtDOM">;

/** A DOM text node and the caret's offset in it. */
export interface CaretInText {
  readonly node: Text;
  readonly offset: number;
}

/**
 * ProseMirror's DOM observer is internal to prosemirror-view (not in its typings); writing in
 * place is only done when it is there, so a future version without it falls back to the
 * ordinary path instead of misbehaving.
 */
type WithDomObserver = { domObserver?: { stopped?: (f: () => void) => void } };

/** Runs `edit` with ProseMirror's DOM observer paused; false, without running it, when the observer is not reachable. */
function withObserverPaused(view: object, edit: () => void): boolean {
  const observer = (view as WithDomObserver).domObserver;
  if (typeof observer?.stopped !== "function") return false;
  observer.stopped(edit);
  return true;
}

const TEXT_NODE = 3;

/**
 * Where a typed character could be written straight into the DOM: a collapsed caret, after at
 * least one character, in a textblock holding a single unmarked text node (a step's relation,
 * display math, plain prose), with the DOM text and caret matching the document exactly.
 * Anything else (marks, inline atoms, a stale DOM, a caret at the very start) returns null.
 */
export function caretInPlainText(view: InPlaceView, state: EditorState): CaretInText | null {
  const { selection } = state;
  if (!(selection instanceof TextSelection) || !selection.empty || state.storedMarks) return null;
  const { $from } = selection;
  const parent = $from.parent;
  const text = parent.firstChild;
  if (!parent.isTextblock || parent.childCount !== 1 || !text?.isText || text.marks.length > 0) return null;
  if ($from.parentOffset < 1) return null;
  // the page's selection: an editor inside a shadow root would see its host here, and type the usual way
  const dom = view.dom.ownerDocument.getSelection();
  const node = dom?.focusNode;
  if (!dom || !node || node.nodeType !== TEXT_NODE || dom.anchorNode !== node || dom.anchorOffset !== dom.focusOffset) return null;
  if (dom.focusOffset !== $from.parentOffset || (node as Text).data !== text.text) return null;
  if (view.posAtDOM(node, dom.focusOffset) !== selection.from) return null;
  return { node: node as Text, offset: dom.focusOffset };
}

/**
 * Inserts `text` at the caret of a DOM text node so that the caret ends up after it, without
 * calling the Selection API.
 *
 * Why: placing the caret with `Selection.collapse` during a key event makes Chromium lay out
 * the page and walk the editing host's text for the input method at once, which is half of a
 * keystroke in a long notebook. A live range moves with character-data edits by the DOM
 * standard's rules instead ("replace data"): an insertion strictly before the caret shifts it,
 * a deletion of what precedes it pulls it back. So the character before the caret is written
 * again together with the typed text, in front of itself, and its old copy is deleted:
 * `ab|` → insert "bc" at 1 → `abcb` with the caret at 4 → delete 1 at 3 → `abc|`.
 *
 * The edit runs with ProseMirror's DOM observer paused, so ProseMirror does not read it back
 * as a change of its own; the caller then dispatches the same insertion as a transaction,
 * and ProseMirror, finding text and caret already as the new state says, writes nothing.
 * Should the browser have put the caret elsewhere, ProseMirror places it as usual.
 *
 * Returns false, touching nothing, when ProseMirror's observer is not reachable.
 */
export function writeTypedTextInPlace(view: object, caret: CaretInText, text: string): boolean {
  const { node, offset } = caret;
  return withObserverPaused(view, () => {
    node.insertData(offset - 1, node.data[offset - 1] + text);
    node.deleteData(offset + text.length, 1);
  });
}

/**
 * Takes back {@link writeTypedTextInPlace} when the document did not take the text (a plugin
 * filtered the transaction out or undid it, or dispatching threw): ProseMirror compares a DOM
 * text node with the document only when that node's text changed, so it would not notice.
 * The caret moves back with the deletion, again by the live-range rules.
 */
export function takeBackTypedText(view: object, caret: CaretInText, text: string): void {
  const { node, offset } = caret;
  if (node.data.slice(offset, offset + text.length) === text) withObserverPaused(view, () => node.deleteData(offset, text.length));
}
