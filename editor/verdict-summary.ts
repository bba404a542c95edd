import type { Editor } from "@tiptap/core";
import type { EditorState, Transaction } from "@tiptap/pm/state";
import { QuietTimer } from "./quiet-timer";
import { stepNumberingKey } from "./step-numbering";
import { stepVerdictsKey, tallyVerdicts, type VerdictTally } from "./step-verdicts";

export interface VerdictSummaryFigures {
  readonly tally: VerdictTally;
  /** Verified steps whose verdict rests on numeric probing at random points. */
  readonly probabilistic: number;
}

export function verdictSummaryOf(state: EditorState): VerdictSummaryFigures {
  let probabilistic = 0;
  for (const verdict of stepVerdictsKey.getState(state)?.verdicts.values() ?? []) {
    if (verdict.state === "answered" && verdict.answer.verdict === "verified" && verdict.answer.method.kind === "numeric") probabilistic += 1;
  }
  return { tally: tallyVerdicts(state), probabilistic };
}

/**
 * Calls `show` with the summary now and whenever it changes. Verdicts from the checker show at
 * once; anything else, such as a change of the text (which turns the edited step pending),
 * shows once the editor has been quiet for `quietMs`: on a page, the first keystroke in a step would otherwise re-render the page,
 * and a React commit with the caret in a long notebook costs more than the keystroke itself.
 * Returns the function that stops following.
 */
export function followVerdictSummary(editor: Editor, show: (summary: VerdictSummaryFigures) => void, quietMs = 250): () => void {
  // Typing maps both plugin states without copying them: same maps, same counts.
  let seen: { verdicts: unknown; numbers: unknown } | null = null;
  const refresh = () => {
    const verdicts = stepVerdictsKey.getState(editor.state)?.verdicts;
    const numbers = stepNumberingKey.getState(editor.state)?.numbers;
    if (seen && verdicts && numbers && seen.verdicts === verdicts && seen.numbers === numbers) return;
    seen = { verdicts, numbers };
    show(verdictSummaryOf(editor.state));
  };
  const afterEditing = new QuietTimer(quietMs, refresh);
  // Only the checker's answers show at once; anything else (edits, carets) waits for the pause.
  const onTransaction = ({ transaction }: { transaction: Transaction }) => (transaction.getMeta(stepVerdictsKey) !== undefined ? refresh() : afterEditing.poke());
  refresh();
  editor.on("transaction", onTransaction);
  return () => {
    editor.off("transaction", onTransaction);
    afterEditing.cancel();
  };
}
