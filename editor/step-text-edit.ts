import { ReplaceStep } from "@tiptap/pm/transform";
import type { Transaction } from "@tiptap/pm/state";

/**
 * The ids of the steps whose relation text a transaction edits, or null when it changes anything
 * else (a block added, removed or moved, an attribute, text outside steps, a co-author's update).
 * Typing in a step is by far the most common transaction; plugins that derive something from
 * every step (numbers, verdict marks) can map their old result through it instead of rebuilding
 * it, which in a long notebook was most of a keystroke's cost.
 *
 * @example
 * editedStepIds(typingInStep3) // ["st-3"]
 * editedStepIds(insertHeading) // null
 */
export function editedStepIds(tr: Transaction): string[] | null {
  const ids: string[] = [];
  for (let i = 0; i < tr.steps.length; i += 1) {
    const step = tr.steps[i];
    if (!(step instanceof ReplaceStep)) return null;
    const { from, to, slice } = step;
    if (slice.openStart !== 0 || slice.openEnd !== 0) return null;
    let textOnly = true;
    slice.content.forEach((node) => {
      if (!node.isText) textOnly = false;
    });
    if (!textOnly) return null;
    const doc = tr.docs[i];
    const $from = doc.resolve(from);
    const $to = doc.resolve(to);
    const parent = $from.parent;
    if (parent.type.name !== "step" || !$from.sameParent($to)) return null;
    const id = parent.attrs.id as string | null;
    if (!id) return null;
    if (!ids.includes(id)) ids.push(id);
  }
  return ids;
}
