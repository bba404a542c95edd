import type { Node as PMNode } from "@tiptap/pm/model";
import type { Decoration } from "@tiptap/pm/view";
import { QuietTimer } from "@/editor/quiet-timer";
import type { StepVerdict } from "@/editor/step-verdicts";

interface StepViewUpdate {
  oldNode: PMNode;
  newNode: PMNode;
  oldDecorations: readonly Decoration[];
  newDecorations: readonly Decoration[];
  updateProps: () => void;
}

const PREVIEW_QUIET_MS = 120;
/** Per step id: the timer, and the latest re-render to run when it fires. */
const pendingPreviews = new Map<string, { quiet: QuietTimer; updateProps: () => void }>();

function shallowEqual(a: Record<string, unknown>, b: Record<string, unknown>): boolean {
  const keys = Object.keys(a);
  return keys.length === Object.keys(b).length && keys.every((key) => Object.is(a[key], b[key]));
}

const turnedPending = (a: Record<string, unknown>, b: Record<string, unknown>): boolean =>
  "verdict" in a && "verdict" in b && (b.verdict as StepVerdict | null)?.state === "pending" && (a.verdict as StepVerdict | null)?.state !== "pending";

/**
 * Same numbers and verdicts, except that the step's verdict went back to pending (what typing
 * in it does first). ProseMirror has already put `data-verdict="pending"` on the step's outer
 * element from the decoration, and the notebook's CSS marks the margin as out of date from
 * that, so the words in the margin can wait for the pause with the preview.
 */
export function onlyTextOrTurnedPending(a: readonly Decoration[], b: readonly Decoration[]): boolean {
  return a.length === b.length && a.every((decoration, i) => shallowEqual(decoration.spec, b[i].spec) || turnedPending(decoration.spec, b[i].spec));
}

/**
 * When a step's React view re-renders. Typing in a step changes only its text, which
 * ProseMirror already shows in the source line; the KaTeX preview above it follows once typing
 * pauses. Every React commit with the caret in the editor makes React walk the editable DOM to
 * save and restore the selection, so a commit per keystroke made typing in a long notebook lag.
 * The verdict going back to pending as typing starts waits with it (see onlyTextOrTurnedPending).
 * Anything else (justification, citations, numbers, answered verdicts) re-renders at once.
 */
export function updateStepView({ oldNode, newNode, oldDecorations, newDecorations, updateProps }: StepViewUpdate): boolean {
  if (newNode.type !== oldNode.type) return false;
  const id = newNode.attrs.id as string | null;
  // Our decorations carry numbers and verdicts in their specs (their attributes follow from them).
  const textOnly = id !== null && oldNode.sameMarkup(newNode) && onlyTextOrTurnedPending(oldDecorations, newDecorations);
  const pending = id === null ? undefined : pendingPreviews.get(id);
  if (!textOnly) {
    if (id !== null && pending) {
      pending.quiet.cancel();
      pendingPreviews.delete(id);
    }
    updateProps();
    return true;
  }
  if (pending) {
    pending.updateProps = updateProps;
    pending.quiet.poke();
    return true;
  }
  const entry = {
    updateProps,
    quiet: new QuietTimer(PREVIEW_QUIET_MS, () => {
      pendingPreviews.delete(id);
      entry.updateProps();
    }),
  };
  pendingPreviews.set(id, entry);
  entry.quiet.poke();
  return true;
}
