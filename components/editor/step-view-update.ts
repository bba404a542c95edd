import type { Node as PMNode } from "@tiptap/pm/model";
import type { Decoration } from "@tiptap/pm/view";
import { QuietTimer } from "@/editor/quiet-timer";

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

/** Same numbers and verdicts: our decorations carry them in their specs (attributes follow from them). */
function sameDecorations(a: readonly Decoration[], b: readonly Decoration[]): boolean {
  return a.length === b.length && a.every((decoration, i) => shallowEqual(decoration.spec, b[i].spec));
}

function shallowEqual(a: Record<string, unknown>, b: Record<string, unknown>): boolean {
  const keys = Object.keys(a);
  return keys.length === Object.keys(b).length && keys.every((key) => Object.is(a[key], b[key]));
}

/**
 * When a step's React view re-renders. Typing in a step changes only its text, which
 * ProseMirror already shows in the source line; the KaTeX preview above it follows once typing
 * pauses. Every React commit with the caret in the editor makes React walk the editable DOM to
 * save and restore the selection, so a commit per keystroke made typing in a long notebook lag.
 * Anything else (justification, citations, numbers, verdicts) re-renders at once.
 */
export function updateStepView({ oldNode, newNode, oldDecorations, newDecorations, updateProps }: StepViewUpdate): boolean {
  if (newNode.type !== oldNode.type) return false;
  const id = newNode.attrs.id as string | null;
  const textOnly = id !== null && oldNode.sameMarkup(newNode) && sameDecorations(oldDecorations, newDecorations);
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
