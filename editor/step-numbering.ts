import { Extension } from "@tiptap/core";
import type { Node as PMNode } from "@tiptap/pm/model";
import { Plugin, PluginKey } from "@tiptap/pm/state";
import { Decoration, DecorationSet } from "@tiptap/pm/view";
import { editedStepIds } from "./step-text-edit";

export interface StepNumberingState {
  /** Step id → its current number (1-based, document order). */
  readonly numbers: ReadonlyMap<string, number>;
  readonly decorations: DecorationSet;
}

export const stepNumberingKey = new PluginKey<StepNumberingState>("stepNumbering");

/**
 * Numbers the steps of a document in order, 1-based. Steps without an id are counted but
 * cannot be looked up.
 *
 * @example
 * numberSteps(doc).get("st-a") // 3 when st-a is the third step
 */
export function numberSteps(doc: PMNode): Map<string, number> {
  const numbers = new Map<string, number>();
  let count = 0;
  doc.descendants((node) => {
    if (node.type.name === "step") {
      count += 1;
      if (node.attrs.id && !numbers.has(node.attrs.id)) numbers.set(node.attrs.id, count);
      return false;
    }
    return node.isBlock;
  });
  return numbers;
}

function buildDecorations(doc: PMNode, numbers: ReadonlyMap<string, number>): DecorationSet {
  const decorations: Decoration[] = [];
  doc.descendants((node, pos) => {
    if (node.type.name === "step") {
      const stepNumber = numbers.get(node.attrs.id) ?? null;
      // Strings and numbers only: node views re-render when a spec value changes (shallow compare).
      const citedNumbers = ((node.attrs.cites ?? []) as string[]).map((id) => numbers.get(id) ?? "?").join(" ");
      const followsNumber = node.attrs.follows ? (numbers.get(node.attrs.follows) ?? null) : null;
      decorations.push(
        Decoration.node(pos, pos + node.nodeSize, { "data-step-number": String(stepNumber ?? "") }, { stepNumber, citedNumbers, followsNumber }),
      );
      return false;
    }
    if (node.type.name === "stepRef") {
      const stepNumber = numbers.get(node.attrs.stepId) ?? null;
      decorations.push(Decoration.node(pos, pos + node.nodeSize, {}, { stepNumber }));
    }
    return true;
  });
  return DecorationSet.create(doc, decorations);
}

/**
 * Step numbers are computed, never stored: this plugin derives them from document order
 * after every change and hands each step and each citation (`stepRef`) its current number
 * through a node decoration whose spec is `{ stepNumber }`. Node views read it from their
 * decorations, so a citation shows the cited step's new number as soon as steps move.
 *
 * @example
 * stepNumberingKey.getState(editor.state)?.numbers.get(id)
 */
export const StepNumbering = Extension.create({
  name: "stepNumbering",

  addProseMirrorPlugins() {
    return [
      new Plugin<StepNumberingState>({
        key: stepNumberingKey,
        state: {
          init: (_config, state) => {
            const numbers = numberSteps(state.doc);
            return { numbers, decorations: buildDecorations(state.doc, numbers) };
          },
          apply: (tr, old) => {
            if (!tr.docChanged) return old;
            // Text typed in a step changes no number: move the marks along instead of rebuilding them.
            if (editedStepIds(tr) !== null) return { numbers: old.numbers, decorations: old.decorations.map(tr.mapping, tr.doc) };
            const numbers = numberSteps(tr.doc);
            return { numbers, decorations: buildDecorations(tr.doc, numbers) };
          },
        },
        props: {
          decorations: (state) => stepNumberingKey.getState(state)?.decorations,
        },
      }),
    ];
  },
});

export interface StepNumberSpec {
  readonly stepNumber: number | null;
  /** Current numbers of the cited steps, space-separated, "?" for a removed one. */
  readonly citedNumbers: string;
  readonly followsNumber: number | null;
}

/** Reads a step's numbering spec inside its node view. */
export function stepNumberingFromDecorations(decorations: readonly { spec: unknown }[]): StepNumberSpec {
  for (const decoration of decorations) {
    const spec = decoration.spec as Partial<StepNumberSpec> | undefined;
    if (spec && "citedNumbers" in spec) return { stepNumber: spec.stepNumber ?? null, citedNumbers: spec.citedNumbers ?? "", followsNumber: spec.followsNumber ?? null };
  }
  return { stepNumber: null, citedNumbers: "", followsNumber: null };
}

/** Reads the decoration spec's step number inside a node view (null when the step is gone). */
export function stepNumberFromDecorations(decorations: readonly { spec: unknown }[]): number | null {
  for (const decoration of decorations) {
    const spec = decoration.spec as { stepNumber?: number | null } | undefined;
    if (spec && "stepNumber" in spec) return spec.stepNumber ?? null;
  }
  return null;
}
