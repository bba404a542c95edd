import { Extension } from "@tiptap/core";
import { TextSelection } from "@tiptap/pm/state";
import type { EditorState, Transaction } from "@tiptap/pm/state";

/** The keys, for the help line in the editor's toolbar. */
export const MATH_SHORTCUTS = [
  { keys: "Mod-/", does: "fraction \\frac{…}{…}" },
  { keys: "Alt-ArrowUp", does: "power ^{…}" },
  { keys: "Alt-ArrowDown", does: "subscript _{…}" },
  { keys: "Mod-Shift-9", does: "\\left( … \\right)" },
  { keys: "Mod-Shift-M", does: "inline math" },
  { keys: "Mod-Enter", does: "new step" },
] as const;

/**
 * Wraps the selection of a LaTeX source in `before … after` and puts the caret where the
 * author types next: inside the first empty slot, or after the wrapped text.
 */
export function wrapLatexSelection(state: EditorState, before: string, after: string, caretInSecondSlot = false): Transaction | null {
  const { from, to, $from } = state.selection;
  if (!$from.parent.type.spec.code || !$from.sameParent(state.selection.$to)) return null;
  const selected = state.doc.textBetween(from, to);
  const tr = state.tr.insertText(`${before}${selected}${after}`, from, to);
  const caret = selected && caretInSecondSlot ? from + before.length + selected.length + after.indexOf("{") + 1 : from + before.length + selected.length;
  return tr.setSelection(TextSelection.create(tr.doc, selected && !caretInSecondSlot ? caret + after.length : caret));
}

/**
 * Keyboard shortcuts for entering mathematics.
 *
 * Contract: inside a LaTeX source (a step or display formula) the keys wrap the selection:
 * Mod-/ → `\frac{sel}{…}` (caret in the denominator when something was selected),
 * Alt-↑ → `^{sel}`, Alt-↓ → `_{sel}`, Mod-Shift-9 → `\left(sel\right)`. In prose Mod-Shift-M
 * turns the selection (or nothing) into inline math. Greek letters are typed as `\alpha`;
 * in prose `\alpha` and a space becomes inline math (math-inline.ts). No plugin state.
 *
 * @example
 * // in a step, select "r_s" and press Mod-/ → "\frac{r_s}{}" with the caret in the denominator
 */
export const MathShortcuts = Extension.create({
  name: "mathShortcuts",

  addKeyboardShortcuts() {
    const run = (build: (state: EditorState) => Transaction | null) => () => {
      const tr = build(this.editor.state);
      if (!tr) return false;
      this.editor.view.dispatch(tr);
      return true;
    };
    return {
      "Mod-/": run((state) => wrapLatexSelection(state, "\\frac{", "}{}", true)),
      "Alt-ArrowUp": run((state) => wrapLatexSelection(state, "^{", "}")),
      "Alt-ArrowDown": run((state) => wrapLatexSelection(state, "_{", "}")),
      "Mod-Shift-9": run((state) => wrapLatexSelection(state, "\\left(", "\\right)")),
      "Mod-Shift-m": ({ editor }) => {
        const { from, to, $from } = editor.state.selection;
        if ($from.parent.type.spec.code || !editor.schema.nodes.mathInline) return false;
        const latex = editor.state.doc.textBetween(from, to) || "x";
        return editor.chain().insertContentAt({ from, to }, { type: "mathInline", attrs: { latex } }).run();
      },
    };
  },
});
