import "server-only";
import type { JSONContent } from "@tiptap/core";
import type { CheckAnswer, CheckMethod, CheckRequest } from "@/cas/check/protocol";
import type { VerbOutcome } from "@/cas/api/index";
import { sharedCasPool } from "@/cas/worker/node-pool";
import { planStepCheck } from "@/editor/check-request";
import { extractDerivation, type DerivationStep } from "@/editor/derivation";

/** A ledger verdict: the checker's three answers. "pending" never reaches a ledger. */
export type LedgerVerdict = "verified" | "refuted" | "undecided";

/** One step of a check ledger: what it said, why, and what the checker answered at publication. */
export interface LedgerEntry {
  readonly number: number;
  readonly id: string;
  readonly relation: string;
  readonly justification: { readonly kind: DerivationStep["kind"]; readonly detail: string; readonly cites: readonly string[]; readonly follows: string | null };
  readonly verdict: LedgerVerdict;
  readonly method: CheckMethod;
  readonly witness?: Readonly<Record<string, string>>;
  readonly reason?: string;
}

/** Runs one check request; the seam tests replace. */
export type RunCheck = (request: CheckRequest) => Promise<VerbOutcome>;

/**
 * Checks at publication get more time than live checks in the editor (2 s): a busy machine
 * must not turn a sound step into "undecided" in a record that can never change.
 */
export const LEDGER_TIME_LIMIT_MS = 6000;

export const poolCheck: RunCheck = (request) => sharedCasPool().run("check", request, LEDGER_TIME_LIMIT_MS);

const TRANSIENT = new Set(["timeout", "busy"]);

async function runWithRetry(run: RunCheck, request: CheckRequest): Promise<VerbOutcome> {
  const first = await run(request);
  if (first.ok || !TRANSIENT.has(first.error.code)) return first;
  return run(request);
}

function undecided(detail: string): Pick<LedgerEntry, "verdict" | "method"> {
  return { verdict: "undecided", method: { kind: "none", detail } };
}

/** The verdict of one planned step, as the ledger records it. */
async function verdictOf(run: RunCheck, request: CheckRequest): Promise<Pick<LedgerEntry, "verdict" | "method" | "witness" | "reason">> {
  const outcome = await runWithRetry(run, request);
  if (!outcome.ok) return undecided(`The checker could not run this step: ${outcome.error.message}`);
  const answer = outcome.value as CheckAnswer;
  return {
    verdict: answer.verdict,
    method: answer.method,
    ...(answer.witness ? { witness: answer.witness } : {}),
    ...(answer.reason ? { reason: answer.reason } : {}),
  };
}

/**
 * Re-runs the check of every step of a document in the worker pool (two at a time, the pool's
 * size) and returns the check ledger in step order. A step the checker cannot plan or run is
 * recorded as undecided with the reason in its method — never as verified.
 */
export async function buildLedger({ content, run = poolCheck, only }: { content: JSONContent; run?: RunCheck; only?: ReadonlySet<string> }): Promise<LedgerEntry[]> {
  const derivation = extractDerivation(content);
  const steps = only ? derivation.steps.filter((s) => only.has(s.id)) : derivation.steps;
  const entries: LedgerEntry[] = new Array(steps.length);
  let next = 0;
  const worker = async () => {
    while (next < steps.length) {
      const index = next++;
      const step = steps[index];
      const plan = planStepCheck(derivation, step.id);
      const result = "request" in plan ? await verdictOf(run, plan.request) : undecided(`Not checked: ${plan.notChecked}`);
      entries[index] = {
        number: step.number,
        id: step.id,
        relation: step.relation,
        justification: { kind: step.kind, detail: step.detail, cites: step.cites, follows: step.followsId },
        ...result,
      };
    }
  };
  await Promise.all([worker(), worker()]);
  return entries;
}

/** Steps per verdict, e.g. { verified: 20, undecided: 5, refuted: 1 }. */
export function tallyLedger(ledger: readonly LedgerEntry[]): Record<LedgerVerdict, number> {
  const tally: Record<LedgerVerdict, number> = { verified: 0, refuted: 0, undecided: 0 };
  for (const entry of ledger) tally[entry.verdict] += 1;
  return tally;
}
