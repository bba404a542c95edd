import type { CheckAnswer, CheckError, CheckRequest } from "@/cas/check/protocol";
import type { StepCheckPlan } from "./check-request";
import type { StepVerdict } from "./step-verdicts";
import { QuietTimer } from "./quiet-timer";

/**
 * Anything that can check a step: the CAS browser worker, or the HTTP route as a fallback.
 * It must honour `signal` (abandon the work) where it can; the scheduler ignores late answers anyway.
 */
export interface StepChecker {
  check(request: CheckRequest, signal?: AbortSignal): Promise<CheckAnswer | CheckError>;
}

export function isCheckError(result: CheckAnswer | CheckError): result is CheckError {
  return "error" in result;
}

export interface CheckSchedulerOptions {
  readonly checker: StepChecker;
  /** Called with the verdicts that changed; the editor records them in its verdict plugin. */
  readonly onVerdicts: (entries: ReadonlyArray<readonly [string, StepVerdict]>) => void;
  /** Quiet time after the last edit before checks start (ms). */
  readonly debounceMs?: number;
  /** Checks running at once; the worker is single-threaded, more would only queue. */
  readonly concurrency?: number;
  /** How many distinct answers to remember (requests are deterministic). */
  readonly cacheSize?: number;
}

/** Error codes that say nothing about the step (the engine was cold, busy or stopped): retried, never cached. */
const TRANSIENT_ERRORS = new Set(["timeout", "aborted", "busy", "internal", "unavailable:checker"]);

function isTransient(result: CheckAnswer | CheckError): boolean {
  return isCheckError(result) && TRANSIENT_ERRORS.has(result.error.code);
}

type Slot = { key: string; controller?: AbortController; verdict?: StepVerdict };

/**
 * Runs step checks off the typing path: `plan()` is called only after the document has been
 * quiet for `debounceMs`, each step's request is sent only when it changed, an edited step's
 * in-flight check is aborted, and an answer that arrives for a request that is no longer
 * current is dropped. Identical requests are answered from a small cache.
 *
 * @example
 * const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => editor.commands.setStepVerdicts(v) });
 * editor.on("update", () => scheduler.schedule(() => planAll(editor.getJSON())));
 */
export class CheckScheduler {
  private readonly options: Required<CheckSchedulerOptions>;
  private readonly slots = new Map<string, Slot>();
  private readonly cache = new Map<string, CheckAnswer | CheckError>();
  private queue: Array<{ id: string; request: CheckRequest; key: string; retried?: boolean }> = [];
  private running = 0;
  private readonly quiet: QuietTimer;
  private planned: { plan: () => ReadonlyMap<string, StepCheckPlan>; shown?: () => ReadonlyMap<string, StepVerdict> } | null = null;
  private disposed = false;

  constructor(options: CheckSchedulerOptions) {
    this.options = { debounceMs: 400, concurrency: 2, cacheSize: 1000, ...options };
    this.quiet = new QuietTimer(this.options.debounceMs, () => {
      const planned = this.planned;
      this.planned = null;
      if (planned) this.apply(planned.plan(), planned.shown?.());
    });
  }

  /** Re-plans after the quiet period; each call restarts the wait. */
  schedule(plan: () => ReadonlyMap<string, StepCheckPlan>, shown?: () => ReadonlyMap<string, StepVerdict>): void {
    if (this.disposed) return;
    this.planned = { plan, shown };
    this.quiet.poke();
  }

  /**
   * Applies a plan now (used on first load, and by `schedule`). `shown` is what the margin
   * shows: a step shown as pending whose request came back unchanged (an edit undone)
   * gets its known verdict again.
   */
  apply(plans: ReadonlyMap<string, StepCheckPlan>, shown?: ReadonlyMap<string, StepVerdict>): void {
    if (this.disposed) return;
    const changed: Array<readonly [string, StepVerdict]> = [];
    for (const [id, slot] of this.slots) {
      if (!plans.has(id)) {
        slot.controller?.abort();
        this.slots.delete(id);
      }
    }
    for (const [id, plan] of plans) {
      const key = "request" in plan ? JSON.stringify(plan.request) : `not-checked:${plan.notChecked}`;
      const slot = this.slots.get(id);
      const failedBriefly = slot?.verdict?.state === "failed" && TRANSIENT_ERRORS.has(slot.verdict.error.code);
      if (slot?.key === key && !failedBriefly) {
        if (slot.verdict && shown?.get(id)?.state === "pending") changed.push([id, slot.verdict]);
        continue;
      }
      slot?.controller?.abort();
      this.queue = this.queue.filter((job) => job.id !== id);
      if (!("request" in plan)) {
        const verdict: StepVerdict = { state: "not-checked", reason: plan.notChecked };
        this.slots.set(id, { key, verdict });
        changed.push([id, verdict]);
        continue;
      }
      const cached = this.cache.get(key);
      if (cached) {
        const verdict = this.toVerdict(cached);
        this.slots.set(id, { key, verdict });
        changed.push([id, verdict]);
        continue;
      }
      this.slots.set(id, { key });
      changed.push([id, { state: "pending" }]);
      this.queue.push({ id, request: plan.request, key });
    }
    if (changed.length) this.options.onVerdicts(changed);
    this.pump();
  }

  /** Stops all work; later answers are ignored. */
  dispose(): void {
    this.disposed = true;
    this.quiet.cancel();
    for (const slot of this.slots.values()) slot.controller?.abort();
    this.slots.clear();
    this.queue = [];
  }

  private toVerdict(result: CheckAnswer | CheckError): StepVerdict {
    return isCheckError(result) ? { state: "failed", error: result.error } : { state: "answered", answer: result };
  }

  private remember(key: string, result: CheckAnswer | CheckError): void {
    if (isTransient(result)) return;
    this.cache.set(key, result);
    if (this.cache.size > this.options.cacheSize) this.cache.delete(this.cache.keys().next().value as string);
  }

  private pump(): void {
    while (!this.disposed && this.running < this.options.concurrency && this.queue.length) {
      const job = this.queue.shift()!;
      const slot = this.slots.get(job.id);
      if (!slot || slot.key !== job.key) continue;
      const controller = new AbortController();
      slot.controller = controller;
      this.running += 1;
      this.options.checker
        .check(job.request, controller.signal)
        .then(
          (result) => {
            this.remember(job.key, result);
            return this.toVerdict(result);
          },
          (cause: unknown): StepVerdict => ({
            state: "failed",
            error: { code: "unavailable:checker", message: cause instanceof Error ? cause.message : "The checker did not answer." },
          }),
        )
        .then((verdict) => {
          const current = this.slots.get(job.id);
          if (this.disposed || controller.signal.aborted || current?.key !== job.key) return; // stale
          if (verdict.state === "failed" && TRANSIENT_ERRORS.has(verdict.error.code) && !job.retried) {
            this.queue.push({ ...job, retried: true }); // once: a cold worker often times out on its first request
            return;
          }
          current.verdict = verdict;
          this.options.onVerdicts([[job.id, verdict]]);
        })
        .finally(() => {
          this.running -= 1;
          this.pump();
        });
    }
  }
}
