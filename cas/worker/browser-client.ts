"use client";
// Browser only: never import this from server code (it creates a Web Worker).
import type { CheckAnswer, CheckError, CheckRequest } from "../check/protocol";
import type { VerbOutcome } from "../api/index";
import { DEFAULT_TIME_LIMIT_MS, WORKER_STARTUP_LIMIT_MS, timeoutError } from "./limits";

export interface BrowserChecker {
  /** Checks one step; resolves with the answer or a CheckError (never rejects). */
  check(req: CheckRequest, signal?: AbortSignal): Promise<CheckAnswer | CheckError>;
  /** Runs any cas verb by name. */
  run(verb: string, input: unknown, signal?: AbortSignal): Promise<unknown | CheckError>;
  /** Stops the worker; pending requests resolve with an error. */
  dispose(): void;
}

interface Job {
  readonly id: number;
  readonly verb: string;
  readonly input: unknown;
  readonly signal?: AbortSignal;
  readonly resolve: (value: unknown | CheckError) => void;
}

const aborted: CheckError = { error: { code: "aborted", message: "the check was cancelled" } };

/**
 * A checker running in a Web Worker, one request at a time, each under a hard
 * time limit counted from when the worker has loaded: a request that overruns (or is aborted while running) terminates
 * the worker, which is replaced by a fresh one for the next request, so the
 * page never freezes.
 *
 * @example
 * const checker = createBrowserChecker();
 * const answer = await checker.check({ context: {}, from: "(a+b)^2", to: "a^2+2ab+b^2" });
 * if ("error" in answer) showError(answer.error.message); else showVerdict(answer.verdict);
 * checker.dispose();
 */
export function createBrowserChecker(options: { timeLimitMs?: number; startupLimitMs?: number } = {}): BrowserChecker {
  if (typeof window === "undefined" || typeof Worker === "undefined") throw new Error("createBrowserChecker runs in the browser only");
  const timeLimitMs = options.timeLimitMs ?? DEFAULT_TIME_LIMIT_MS;
  const startupLimitMs = options.startupLimitMs ?? WORKER_STARTUP_LIMIT_MS;
  const queue: Job[] = [];
  let worker: Worker | null = null;
  // The worker says when its bundle has loaded; until then the running request waits under the
  // startup limit, and its own time limit starts only once the worker can work on it.
  let ready = false;
  let current: { job: Job; timer: ReturnType<typeof setTimeout>; onAbort: () => void } | null = null;
  let nextId = 1;
  let disposed = false;

  const armTimeLimit = () => {
    if (!current) return;
    clearTimeout(current.timer);
    current.timer = setTimeout(() => restart({ error: timeoutError(timeLimitMs) }), timeLimitMs);
  };

  const start = (): Worker => {
    ready = false;
    const w = new Worker(new URL("./cas.worker.ts", import.meta.url), { type: "module" });
    w.onmessage = (event: MessageEvent<{ ready: true } | { id: number; outcome: VerbOutcome }>) => {
      if ("ready" in event.data) {
        ready = true;
        armTimeLimit();
        return;
      }
      if (!current || event.data.id !== current.job.id) return;
      const { outcome } = event.data;
      finish(outcome.ok ? outcome.value : { error: outcome.error });
    };
    w.onerror = (event) => {
      event.preventDefault();
      restart({ error: { code: "internal", message: "the checker stopped unexpectedly on this request" } });
    };
    return w;
  };

  const finish = (value: unknown | CheckError) => {
    if (!current) return;
    clearTimeout(current.timer);
    current.job.signal?.removeEventListener("abort", current.onAbort);
    const { job } = current;
    current = null;
    job.resolve(value);
    pump();
  };

  /** Ends the running request with `value` and replaces the worker, whose state is unknown. */
  const restart = (value: unknown | CheckError) => {
    worker?.terminate();
    worker = null;
    finish(value);
  };

  const pump = () => {
    if (disposed || current) return;
    const job = queue.shift();
    if (!job) return;
    if (job.signal?.aborted) {
      job.resolve(aborted);
      pump();
      return;
    }
    worker ??= start();
    const onAbort = () => restart(aborted);
    job.signal?.addEventListener("abort", onAbort, { once: true });
    const notStarted = { error: { code: "internal", message: `the checker did not start within ${startupLimitMs / 1000} s; reload the page` } } as const;
    current = { job, onAbort, timer: setTimeout(() => restart(notStarted), startupLimitMs) };
    if (ready) armTimeLimit();
    worker.postMessage({ id: job.id, verb: job.verb, input: job.input });
  };

  const run = (verb: string, input: unknown, signal?: AbortSignal): Promise<unknown | CheckError> =>
    new Promise((resolve) => {
      if (disposed) return resolve({ error: { code: "internal", message: "the checker was disposed" } });
      const job: Job = { id: nextId++, verb, input, signal, resolve };
      queue.push(job);
      signal?.addEventListener("abort", () => {
        const i = queue.indexOf(job);
        if (i >= 0) {
          queue.splice(i, 1);
          resolve(aborted);
        }
      }, { once: true });
      pump();
    });

  return {
    check: (req, signal) => run("check", req, signal) as Promise<CheckAnswer | CheckError>,
    run,
    dispose: () => {
      disposed = true;
      for (const job of queue.splice(0)) job.resolve({ error: { code: "internal", message: "the checker was disposed" } });
      if (current) restart({ error: { code: "internal", message: "the checker was disposed" } });
      worker?.terminate();
      worker = null;
    },
  };
}
