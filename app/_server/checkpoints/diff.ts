import "server-only";
import type { JSONContent } from "@tiptap/core";
import { extractDerivation, type DerivationStep } from "@/editor/derivation";
import { buildLedger, poolCheck, type LedgerEntry, type RunCheck } from "../editions/ledger";

/** One side of a step in a diff: its number, relation and justification there, and its verdict there. */
export interface DiffSide {
  readonly number: number;
  readonly relation: string;
  readonly kind: DerivationStep["kind"];
  readonly detail: string;
  readonly cites: readonly string[];
  readonly verdict: LedgerEntry["verdict"] | null;
  readonly method: LedgerEntry["method"] | null;
  readonly witness?: LedgerEntry["witness"];
}

export type StepChange =
  | { readonly change: "added"; readonly id: string; readonly after: DiffSide }
  | { readonly change: "removed"; readonly id: string; readonly before: DiffSide }
  | { readonly change: "changed"; readonly id: string; readonly fields: readonly string[]; readonly before: DiffSide; readonly after: DiffSide };

export interface CheckpointDiff {
  readonly steps: readonly StepChange[];
  readonly unchanged: number;
  /** Whether anything outside the steps (prose, headings, spacetime blocks, figures) differs. */
  readonly otherContentChanged: boolean;
}

function side(step: DerivationStep, ledger: ReadonlyMap<string, LedgerEntry>): DiffSide {
  const entry = ledger.get(step.id);
  return {
    number: step.number,
    relation: step.relation,
    kind: step.kind,
    detail: step.detail,
    cites: step.cites,
    verdict: entry?.verdict ?? null,
    method: entry?.method ?? null,
    ...(entry?.witness ? { witness: entry.witness } : {}),
  };
}

function changedFields(a: DerivationStep, b: DerivationStep): string[] {
  const fields: string[] = [];
  if (a.relation !== b.relation) fields.push("relation");
  if (a.kind !== b.kind || a.detail !== b.detail) fields.push("justification");
  if (a.cites.join(" ") !== b.cites.join(" ") || a.followsId !== b.followsId) fields.push("citations");
  return fields;
}

/** The document with every step removed, to see whether anything else changed. */
function withoutSteps(node: JSONContent): JSONContent {
  return { ...node, content: node.content?.filter((child) => child.type !== "step").map(withoutSteps) };
}

/**
 * Compares two documents step by step, matching steps by their stable id: steps only in
 * `after` are added, only in `before` removed, and in both with a different relation,
 * justification or citations changed (a renumbering alone is not a change). The steps
 * that differ are checked in each version (in the worker pool), so the diff shows their
 * verdicts there.
 */
export async function diffDocuments({ before, after, run = poolCheck }: { before: JSONContent; after: JSONContent; run?: RunCheck }): Promise<CheckpointDiff> {
  const a = extractDerivation(before);
  const b = extractDerivation(after);
  const inA = new Map(a.steps.map((s) => [s.id, s]));
  const inB = new Map(b.steps.map((s) => [s.id, s]));
  const touchedA = new Set<string>();
  const touchedB = new Set<string>();
  let unchanged = 0;
  for (const step of a.steps) {
    const other = inB.get(step.id);
    if (!other) touchedA.add(step.id);
    else if (changedFields(step, other).length) {
      touchedA.add(step.id);
      touchedB.add(step.id);
    } else unchanged += 1;
  }
  for (const step of b.steps) if (!inA.has(step.id)) touchedB.add(step.id);

  const [ledgerA, ledgerB] = await Promise.all([
    touchedA.size ? buildLedger({ content: before, run, only: touchedA }) : [],
    touchedB.size ? buildLedger({ content: after, run, only: touchedB }) : [],
  ]);
  const verdictsA = new Map(ledgerA.map((e) => [e.id, e]));
  const verdictsB = new Map(ledgerB.map((e) => [e.id, e]));

  const steps: StepChange[] = [];
  for (const step of a.steps) {
    const other = inB.get(step.id);
    if (!other) steps.push({ change: "removed", id: step.id, before: side(step, verdictsA) });
    else {
      const fields = changedFields(step, other);
      if (fields.length) steps.push({ change: "changed", id: step.id, fields, before: side(step, verdictsA), after: side(other, verdictsB) });
    }
  }
  for (const step of b.steps) if (!inA.has(step.id)) steps.push({ change: "added", id: step.id, after: side(step, verdictsB) });
  // Show changes in the order of the later document (removed steps at their old place number).
  steps.sort((x, y) => ("after" in x ? x.after.number : x.before.number) - ("after" in y ? y.after.number : y.before.number));

  return { steps, unchanged, otherContentChanged: JSON.stringify(withoutSteps(before)) !== JSON.stringify(withoutSteps(after)) };
}
