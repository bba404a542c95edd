import { InputRule, Node, mergeAttributes } from "@tiptap/core";
import { stepNumberFromDecorations, stepNumberingKey } from "./step-numbering";

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    stepRef: {
      /** Inserts a citation of the step with this id at the selection. */
      insertStepRef: (stepId: string) => ReturnType;
    };
  }
}

/**
 * A citation of a step inside prose, e.g. "inserting (4) into (7)".
 *
 * Contract
 * - Stores only the cited step's stable id (`stepId`); the number shown is the step's
 *   current number, delivered by step-numbering.ts, so it follows renumbering. A citation
 *   of a deleted step reads "(step removed)".
 * - HTML: `<span data-type="step-ref" data-step-id="…">`.
 * - Typing `#4` and a space in prose cites the step that is number 4 at that moment.
 *
 * @example
 * { type: "stepRef", attrs: { stepId: "st-k3v9x0a1qz" } }
 */
export const StepRef = Node.create({
  name: "stepRef",
  group: "inline",
  inline: true,
  atom: true,
  selectable: true,

  addAttributes() {
    return {
      stepId: {
        default: null,
        parseHTML: (element) => element.getAttribute("data-step-id"),
        renderHTML: (attributes) => ({ "data-step-id": attributes.stepId }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'span[data-type="step-ref"]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ["span", mergeAttributes(HTMLAttributes, { "data-type": "step-ref" }), "(step)"];
  },

  addCommands() {
    return {
      insertStepRef:
        (stepId) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs: { stepId } }),
    };
  },

  addInputRules() {
    const type = this.type;
    return [
      new InputRule({
        find: /(?:^|\s)#(\d+) $/,
        handler: ({ state, range, match }) => {
          const wanted = Number(match[1]);
          const numbers = stepNumberingKey.getState(state)?.numbers;
          const id = numbers ? [...numbers].find(([, n]) => n === wanted)?.[0] : undefined;
          if (!id) return null;
          const start = range.from + match[0].indexOf("#");
          state.tr.replaceWith(start, range.to, [type.create({ stepId: id }), state.schema.text(" ")]);
        },
      }),
    ];
  },

  addNodeView() {
    return ({ decorations, editor, node }) => {
      const dom = document.createElement("a");
      dom.dataset.type = "step-ref";
      dom.className = "step-ref";
      let stepId: string = node.attrs.stepId;
      const show = (n: number | null) => {
        dom.textContent = n === null ? "(step removed)" : `(${n})`;
        dom.href = `#step-${stepId}`;
        dom.setAttribute("aria-label", n === null ? "citation of a removed step" : `step ${n}`);
      };
      show(stepNumberFromDecorations(decorations));
      dom.addEventListener("click", (event) => {
        event.preventDefault();
        editor.view.dom.querySelector(`[data-step-id="${CSS.escape(stepId)}"]`)?.scrollIntoView({ block: "center", behavior: "smooth" });
      });
      return {
        dom,
        update: (updated, updatedDecorations) => {
          if (updated.type !== node.type) return false;
          stepId = updated.attrs.stepId;
          show(stepNumberFromDecorations(updatedDecorations));
          return true;
        },
      };
    };
  },
});
