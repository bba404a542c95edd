import { Extension } from "@tiptap/core";
import type { Node as PMNode } from "@tiptap/pm/model";
import { Plugin, PluginKey, type EditorState, type Transaction } from "@tiptap/pm/state";
import { Decoration, DecorationSet } from "@tiptap/pm/view";
import type { CheckAnswer, CheckError } from "@/cas/check/protocol";
import { editedStepIds } from "./step-text-edit";

/**
 * What the margin shows for one step. Only `answered` carries a verdict from the checker;
 * the other states say why there is none (yet).
 */
export type StepVerdict =
  | { readonly state: "pending"; readonly previous?: CheckAnswer }
  | { readonly state: "answered"; readonly answer: CheckAnswer }
  | { readonly state: "failed"; readonly error: CheckError["error"] }
  | { readonly state: "not-checked"; readonly reason: string };

export type VerdictTally = { verified: number; refuted: number; undecided: number; pending: number; notChecked: number };

interface StepVerdictsState {
  readonly verdicts: ReadonlyMap<string, StepVerdict>;
  readonly decorations: DecorationSet;
}

type VerdictMeta = { readonly set: ReadonlyArray<readonly [string, StepVerdict]> };

export const stepVerdictsKey = new PluginKey<StepVerdictsState>("stepVerdicts");

/** The verdict word a step's state stands for in counts and labels. */
export function verdictWord(verdict: StepVerdict | undefined): "verified" | "refuted" | "undecided" | "pending" | "not checked" {
  if (!verdict || verdict.state === "pending") return "pending";
  if (verdict.state === "failed") return "undecided";
  if (verdict.state === "not-checked") return "not checked";
  return verdict.answer.verdict;
}

function stepNodes(doc: PMNode): Map<string, { node: PMNode; pos: number }> {
  const steps = new Map<string, { node: PMNode; pos: number }>();
  doc.descendants((node, pos) => {
    if (node.type.name === "step") {
      if (node.attrs.id) steps.set(node.attrs.id, { node, pos });
      return false;
    }
    return node.isBlock;
  });
  return steps;
}

type VerdictSpec = { readonly verdict: StepVerdict | null; readonly stepId: string };

function verdictDecoration(from: number, to: number, stepId: string, verdict: StepVerdict | undefined): Decoration {
  return Decoration.node(from, to, { "data-verdict": verdictWord(verdict) }, { verdict: verdict ?? null, stepId } satisfies VerdictSpec);
}

function buildDecorations(doc: PMNode, verdicts: ReadonlyMap<string, StepVerdict>): DecorationSet {
  const decorations: Decoration[] = [];
  for (const [id, { node, pos }] of stepNodes(doc)) decorations.push(verdictDecoration(pos, pos + node.nodeSize, id, verdicts.get(id)));
  return DecorationSet.create(doc, decorations);
}

/** Above this many changed steps one rebuild is cheaper than replacing marks one by one. */
const MOST_MARKS_REPLACED = 32;

/**
 * Replaces the marks of the steps in `ids` and keeps every other step's mark (and so its DOM
 * attributes) as it is. In a long notebook a rebuild walks every step and makes ProseMirror
 * compare every mark again, which the first keystroke in a step paid for. Falls back to a
 * rebuild when a step has no mark to replace (new, or a duplicated id) or when many changed.
 */
function replaceDecorations(set: DecorationSet, doc: PMNode, ids: ReadonlySet<string>, verdicts: ReadonlyMap<string, StepVerdict>): DecorationSet {
  if (ids.size === 0) return set;
  if (ids.size > MOST_MARKS_REPLACED) return buildDecorations(doc, verdicts);
  const stale = set.find(undefined, undefined, (spec) => ids.has((spec as Partial<VerdictSpec>).stepId ?? ""));
  if (stale.length !== ids.size) return buildDecorations(doc, verdicts);
  const fresh = stale.map((mark) => {
    const { stepId } = mark.spec as VerdictSpec;
    return verdictDecoration(mark.from, mark.to, stepId, verdicts.get(stepId));
  });
  return set.remove(stale).add(doc, fresh);
}

/** An edited step's old answer stays visible (dimmed) as `previous` until the new one arrives. */
function markPending(id: string, verdicts: Map<string, StepVerdict>): void {
  const current = verdicts.get(id);
  if (current?.state === "answered") verdicts.set(id, { state: "pending", previous: current.answer });
  else if (current?.state !== "pending") verdicts.set(id, { state: "pending" });
}

function markEditedPending(tr: Transaction, oldDoc: PMNode, verdicts: Map<string, StepVerdict>): void {
  const before = stepNodes(oldDoc);
  for (const [id, { node }] of stepNodes(tr.doc)) {
    const old = before.get(id)?.node;
    if (old === node) continue; // ProseMirror reuses untouched nodes
    if (old && old.textContent === node.textContent && old.attrs.kind === node.attrs.kind && old.attrs.detail === node.attrs.detail && old.attrs.cites === node.attrs.cites) continue;
    markPending(id, verdicts);
  }
}

/**
 * Typing in steps (the common case): only those steps can turn pending. When none changes state
 * (already pending from an earlier keystroke), the marks are mapped, not rebuilt for every step.
 */
function applyTyping(tr: Transaction, old: StepVerdictsState, edited: readonly string[], meta: VerdictMeta | undefined): StepVerdictsState {
  // Already pending steps stay as they are: then nothing changes, and nothing is copied.
  const unchanged = !meta && edited.every((id) => old.verdicts.get(id)?.state === "pending");
  const mapped = old.decorations.map(tr.mapping, tr.doc);
  if (unchanged) return { verdicts: old.verdicts, decorations: mapped };
  const verdicts = new Map(old.verdicts);
  for (const id of edited) markPending(id, verdicts);
  for (const [id, verdict] of meta?.set ?? []) verdicts.set(id, verdict);
  const changed = new Set([...edited, ...(meta?.set ?? []).map(([id]) => id)]);
  return { verdicts, decorations: replaceDecorations(mapped, tr.doc, changed, verdicts) };
}

/**
 * Holds the verdict of every step, outside the document: verdicts are derived data that each
 * client computes for itself, so they are never saved nor synced through Yjs.
 *
 * Contract
 * - State: step id → StepVerdict. Set with the `setStepVerdicts` command (the check scheduler
 *   does this); a step whose text or justification changes goes back to `pending` at once,
 *   keeping its old answer as `previous` until the new one arrives.
 * - Each step gets a node decoration with `data-verdict` (the verdict word) and spec
 *   `{ verdict }`, which the step's node view reads for the margin.
 *
 * @example
 * editor.commands.setStepVerdicts([["st-a", { state: "answered", answer }]]);
 * stepVerdictsKey.getState(editor.state)?.verdicts.get("st-a");
 */
export const StepVerdicts = Extension.create({
  name: "stepVerdicts",

  addCommands() {
    return {
      setStepVerdicts:
        (entries: ReadonlyArray<readonly [string, StepVerdict]>) =>
        ({ tr, dispatch }) => {
          if (dispatch) tr.setMeta(stepVerdictsKey, { set: entries } satisfies VerdictMeta).setMeta("addToHistory", false);
          return true;
        },
    };
  },

  addProseMirrorPlugins() {
    return [
      new Plugin<StepVerdictsState>({
        key: stepVerdictsKey,
        state: {
          init: (_config, state) => ({ verdicts: new Map(), decorations: buildDecorations(state.doc, new Map()) }),
          apply: (tr, old, oldState) => {
            const meta = tr.getMeta(stepVerdictsKey) as VerdictMeta | undefined;
            if (!meta && !tr.docChanged) return old;
            const edited = tr.docChanged ? editedStepIds(tr) : null;
            if (edited !== null) return applyTyping(tr, old, edited, meta);
            const verdicts = new Map(old.verdicts);
            if (tr.docChanged) markEditedPending(tr, oldState.doc, verdicts);
            for (const [id, verdict] of meta?.set ?? []) verdicts.set(id, verdict);
            // checker answers alone (the common case once a notebook is open) replace only their steps' marks
            if (!tr.docChanged && meta) return { verdicts, decorations: replaceDecorations(old.decorations, tr.doc, new Set(meta.set.map(([id]) => id)), verdicts) };
            return { verdicts, decorations: buildDecorations(tr.doc, verdicts) };
          },
        },
        props: {
          decorations: (state) => stepVerdictsKey.getState(state)?.decorations,
        },
      }),
    ];
  },
});

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    stepVerdicts: {
      /** Records checker results (or pending / not-checked states) for steps by id. */
      setStepVerdicts: (entries: ReadonlyArray<readonly [string, StepVerdict]>) => ReturnType;
    };
  }
}

/** Counts the verdicts of the steps now in the document. */
export function tallyVerdicts(state: EditorState): VerdictTally {
  const tally: VerdictTally = { verified: 0, refuted: 0, undecided: 0, pending: 0, notChecked: 0 };
  const verdicts = stepVerdictsKey.getState(state)?.verdicts ?? new Map<string, StepVerdict>();
  for (const id of stepNodes(state.doc).keys()) {
    const word = verdictWord(verdicts.get(id));
    if (word === "not checked") tally.notChecked += 1;
    else tally[word] += 1;
  }
  return tally;
}

/** Reads the verdict from a step node view's decorations. */
export function verdictFromDecorations(decorations: readonly { spec: unknown }[]): StepVerdict | null {
  for (const decoration of decorations) {
    const spec = decoration.spec as { verdict?: StepVerdict | null } | undefined;
    if (spec && "verdict" in spec) return spec.verdict ?? null;
  }
  return null;
}
