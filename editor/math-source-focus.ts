import { Extension } from "@tiptap/core";
import { Plugin, PluginKey } from "@tiptap/pm/state";
import { Decoration, DecorationSet } from "@tiptap/pm/view";

/** Node types whose text content is LaTeX source shown under a rendered preview. */
export const LATEX_SOURCE_NODES = ["mathDisplay", "step"] as const;

export const mathSourceFocusKey = new PluginKey<DecorationSet>("mathSourceFocus");

/**
 * Marks the LaTeX-source node that holds the caret with the class `is-editing`, so its
 * source line is shown while it is being written and hidden (preview only) otherwise.
 *
 * Contract: plugin state is a DecorationSet with at most one node decoration; it is
 * recomputed from the selection on every transaction and never touches the document.
 *
 * @example
 * mathSourceFocusKey.getState(editor.state)?.find() // [] when the caret is in prose
 */
export const MathSourceFocus = Extension.create({
  name: "mathSourceFocus",

  addProseMirrorPlugins() {
    return [
      new Plugin<DecorationSet>({
        key: mathSourceFocusKey,
        state: {
          init: () => DecorationSet.empty,
          apply: (tr, _old, _oldState, newState) => {
            const { $from } = newState.selection;
            for (let depth = $from.depth; depth > 0; depth--) {
              const node = $from.node(depth);
              if ((LATEX_SOURCE_NODES as readonly string[]).includes(node.type.name)) {
                const start = $from.before(depth);
                return DecorationSet.create(newState.doc, [
                  Decoration.node(start, start + node.nodeSize, { class: "is-editing" }),
                ]);
              }
            }
            return DecorationSet.empty;
          },
        },
        props: {
          decorations: (state) => mathSourceFocusKey.getState(state),
        },
      }),
    ];
  },
});
