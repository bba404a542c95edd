import type { EditorState } from "@tiptap/pm/state";
import { stepVerdictsKey, verdictWord } from "./step-verdicts";

export type OutlineEntry =
  | { readonly kind: "section"; readonly level: number; readonly text: string; readonly pos: number }
  | { readonly kind: "step"; readonly id: string; readonly number: number; readonly relation: string; readonly verdict: ReturnType<typeof verdictWord>; readonly pos: number }
  | { readonly kind: "spacetime"; readonly name: string; readonly pos: number };

/**
 * The outline of a notebook: its section headings, spacetime blocks and steps in order,
 * each with its position (to jump to) and, for steps, the current number and verdict word.
 *
 * @example
 * outlineOf(editor.state).find((e) => e.kind === "step" && e.verdict === "refuted")
 */
export function outlineOf(state: EditorState): OutlineEntry[] {
  const verdicts = stepVerdictsKey.getState(state)?.verdicts;
  const entries: OutlineEntry[] = [];
  let number = 0;
  state.doc.descendants((node, pos) => {
    if (node.type.name === "heading") {
      entries.push({ kind: "section", level: node.attrs.level, text: node.textContent, pos });
      return false;
    }
    if (node.type.name === "spacetimeBlock") {
      entries.push({ kind: "spacetime", name: node.attrs.name, pos });
      return false;
    }
    if (node.type.name === "step") {
      number += 1;
      if (node.attrs.id) {
        entries.push({ kind: "step", id: node.attrs.id, number, relation: node.textContent, verdict: verdictWord(verdicts?.get(node.attrs.id)), pos });
      }
      return false;
    }
    return node.isBlock;
  });
  return entries;
}
