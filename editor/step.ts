import { Node, mergeAttributes } from "@tiptap/core";
import { TextSelection } from "@tiptap/pm/state";
import { newStepId } from "./step-id";

/** The author's stated reason for a step; the names match the checker protocol's `Justification.kind`. */
export const JUSTIFICATION_KINDS = ["algebra", "substitute", "differentiate", "euler-lagrange", "limit", "definition"] as const;
export type JustificationKind = (typeof JUSTIFICATION_KINDS)[number];

/** What the `detail` field holds for each justification kind, as shown to the author. */
export const JUSTIFICATION_DETAIL_HINT: Record<JustificationKind, string> = {
  algebra: "",
  substitute: "relations to substitute, separated by ; (cited steps are added)",
  differentiate: "the variable, e.g. r",
  "euler-lagrange": "the coordinate, e.g. r",
  limit: "e.g. c \\to \\infty",
  definition: "",
};

export interface StepAttributes {
  /** Stable id; never reused, kept through renumbering and moves. */
  readonly id: string | null;
  readonly kind: JustificationKind;
  /** The justification's argument in LaTeX/plain text (see JUSTIFICATION_DETAIL_HINT). */
  readonly detail: string;
  /** Ids of earlier steps this step cites (for a substitution: the relations substituted). */
  readonly cites: readonly string[];
  /** Id of the step this one follows from, when it is not simply the previous step. */
  readonly follows: string | null;
}

export function isJustificationKind(value: unknown): value is JustificationKind {
  return typeof value === "string" && (JUSTIFICATION_KINDS as readonly string[]).includes(value);
}

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    step: {
      /** Inserts a step after the current top-level block and puts the caret in it. */
      insertStep: (step?: { relation?: string; kind?: JustificationKind; detail?: string; cites?: string[]; follows?: string | null }) => ReturnType;
      /** Changes the justification or citations of the step with this id. */
      updateStep: (id: string, attrs: Partial<Omit<StepAttributes, "id">>) => ReturnType;
    };
  }
}

/**
 * A step: one relation of the derivation (its LaTeX source is the node's text) with the
 * author's justification and the earlier steps it cites.
 *
 * Contract
 * - Attributes: `id` (stable, see step-ids.ts), `kind` (one of JUSTIFICATION_KINDS), `detail`
 *   (the justification's argument), `cites` (ids of cited steps), `follows` (id of the step it
 *   follows from when that is not the previous one). The number is NOT stored: it is computed
 *   from document order (step-numbering.ts).
 * - Content is plain LaTeX text without marks, so co-authors merge character by character.
 * - HTML: `<div data-type="step" data-step-id data-justification data-detail data-cites="id id" data-follows><pre>…</pre></div>`.
 * - Keys: Enter at the end of a step opens the next step; Enter in an empty step turns it
 *   into a paragraph; Mod-Enter inserts a step below the current block from anywhere.
 *
 * @example
 * { type: "step", attrs: { id: "st-a", kind: "differentiate", detail: "r", cites: [] },
 *   content: [{ type: "text", text: "\\frac{dV}{dr} = 0" }] }
 */
export const Step = Node.create({
  name: "step",
  group: "block",
  content: "text*",
  marks: "",
  code: true,
  defining: true,

  addAttributes() {
    return {
      id: {
        default: null,
        parseHTML: (element) => element.getAttribute("data-step-id"),
        renderHTML: (attributes) => (attributes.id ? { "data-step-id": attributes.id } : {}),
      },
      kind: {
        default: "algebra",
        parseHTML: (element) => {
          const value = element.getAttribute("data-justification");
          return isJustificationKind(value) ? value : "algebra";
        },
        renderHTML: (attributes) => ({ "data-justification": attributes.kind }),
      },
      detail: {
        default: "",
        parseHTML: (element) => element.getAttribute("data-detail") ?? "",
        renderHTML: (attributes) => (attributes.detail ? { "data-detail": attributes.detail } : {}),
      },
      cites: {
        default: [],
        parseHTML: (element) => (element.getAttribute("data-cites") ?? "").split(/\s+/).filter(Boolean),
        renderHTML: (attributes) => (attributes.cites?.length ? { "data-cites": attributes.cites.join(" ") } : {}),
      },
      follows: {
        default: null,
        parseHTML: (element) => element.getAttribute("data-follows") || null,
        renderHTML: (attributes) => (attributes.follows ? { "data-follows": attributes.follows } : {}),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="step"]', preserveWhitespace: "full", contentElement: "pre" }];
  },

  renderHTML({ HTMLAttributes }) {
    return ["div", mergeAttributes(HTMLAttributes, { "data-type": "step" }), ["pre", 0]];
  },

  renderText({ node }) {
    return `\\[${node.textContent}\\]`;
  },

  addCommands() {
    return {
      insertStep:
        (step = {}) =>
        ({ state, tr, dispatch }) => {
          const { $from } = state.selection;
          const after = $from.depth > 0 ? $from.after(1) : state.doc.content.size;
          const node = this.type.create(
            { id: newStepId(), kind: step.kind ?? "algebra", detail: step.detail ?? "", cites: step.cites ?? [], follows: step.follows ?? null },
            step.relation ? state.schema.text(step.relation) : null,
          );
          if (dispatch) {
            tr.insert(after, node);
            tr.setSelection(TextSelection.create(tr.doc, after + 1 + node.content.size));
            tr.scrollIntoView();
          }
          return true;
        },
      updateStep:
        (id, attrs) =>
        ({ state, tr, dispatch }) => {
          let found = -1;
          state.doc.descendants((node, pos) => {
            if (found >= 0) return false;
            if (node.type === this.type && node.attrs.id === id) found = pos;
            return node.isBlock && found < 0;
          });
          if (found < 0) return false;
          if (dispatch) {
            for (const [key, value] of Object.entries(attrs)) tr.setNodeAttribute(found, key, value);
          }
          return true;
        },
    };
  },

  addKeyboardShortcuts() {
    return {
      Enter: ({ editor }) => {
        const { $from, empty } = editor.state.selection;
        if (!empty || $from.parent.type !== this.type) return false;
        if ($from.parent.content.size === 0) return editor.commands.setNode("paragraph");
        if ($from.parentOffset !== $from.parent.content.size) return true; // a relation is one line
        return editor.commands.insertStep();
      },
      "Mod-Enter": ({ editor }) => editor.commands.insertStep(),
      "Shift-Enter": ({ editor }) => editor.state.selection.$from.parent.type === this.type,
    };
  },
});
