import { Worker } from "node:worker_threads";
import path from "node:path";
import type { VerbOutcome } from "../api/index";
import { DEFAULT_TIME_LIMIT_MS, MAX_QUEUE, WORKER_HEAP_MB, timeoutError } from "./limits";

interface Job {
  readonly id: number;
  readonly verb: string;
  readonly input: unknown;
  readonly timeLimitMs: number;
  readonly resolve: (outcome: VerbOutcome) => void;
}

interface Slot {
  worker: Worker;
  ready: boolean;
  job: Job | null;
  timer: NodeJS.Timeout | null;
}

/** Where the worker entry lives; the project root is the working directory for Next, the CLI and the tests. */
function entryPath(): string {
  return path.join(process.cwd(), "cas", "worker", "node-entry.mjs");
}

/**
 * A pool of warm worker threads running cas verbs under a hard time limit.
 * A request that overruns is answered with a `timeout` error, its worker is
 * terminated and a fresh one started, so the next request is served. A worker
 * that dies (out of memory under its heap cap) answers its request with an
 * error and is replaced too. The time limit counts from when a ready worker
 * takes the request, not from worker start-up or queueing.
 *
 * @example
 * const pool = new NodeCasPool({ size: 2 });
 * await pool.run("check", request) // { ok: true, value: { verdict: "verified", … } }
 * await pool.close();
 */
export class NodeCasPool {
  private readonly slots: Slot[] = [];
  private readonly queue: Job[] = [];
  private nextId = 1;
  private closed = false;
  /** Workers that died before ever becoming ready, in a row: a broken entry must not respawn forever. */
  private failedStarts = 0;

  constructor(private readonly options: { size?: number; timeLimitMs?: number } = {}) {
    const size = Math.max(1, Math.min(4, options.size ?? 1));
    for (let i = 0; i < size; i += 1) this.slots.push(this.spawn());
  }

  /** Runs one verb; never rejects. */
  run(verb: string, input: unknown, timeLimitMs = this.options.timeLimitMs ?? DEFAULT_TIME_LIMIT_MS): Promise<VerbOutcome> {
    if (this.closed) return Promise.resolve({ ok: false, error: { code: "internal", message: "the cas pool is closed" } });
    if (this.queue.length >= MAX_QUEUE) return Promise.resolve({ ok: false, error: { code: "busy", message: "the checker is busy; try again in a moment" } });
    return new Promise((resolve) => {
      this.queue.push({ id: this.nextId++, verb, input, timeLimitMs, resolve });
      this.dispatch();
    });
  }

  /** Stops every worker; pending requests are answered with an error. */
  async close(): Promise<void> {
    this.closed = true;
    for (const job of this.queue.splice(0)) job.resolve({ ok: false, error: { code: "internal", message: "the cas pool was closed" } });
    await Promise.all(this.slots.map(async (slot) => {
      if (slot.timer) clearTimeout(slot.timer);
      slot.job?.resolve({ ok: false, error: { code: "internal", message: "the cas pool was closed" } });
      slot.job = null;
      await slot.worker.terminate();
    }));
  }

  private spawn(): Slot {
    // Reflect.construct, not `new Worker(...)`: Next's bundler rewrites the literal form into a
    // bundled worker chunk, and the entry (tsx's loader) must run from disk as it is.
    const worker: Worker = Reflect.construct(Worker, [entryPath(), { resourceLimits: { maxOldGenerationSizeMb: WORKER_HEAP_MB, stackSizeMb: 8 } }]);
    const slot: Slot = { worker, ready: false, job: null, timer: null };
    worker.on("message", (message: { ready?: true; id?: number; outcome?: VerbOutcome }) => {
      if (message.ready) {
        slot.ready = true;
        this.failedStarts = 0;
        this.dispatch();
        return;
      }
      if (!slot.job || message.id !== slot.job.id) return;
      this.finish(slot, message.outcome!);
    });
    worker.on("error", (err) => {
      console.error("cas worker failed", err);
      this.replace(slot, { ok: false, error: { code: "too_large", message: "the request needed more memory or stack than a check may use" } });
    });
    worker.on("exit", () => {
      if (!this.closed && this.slots.includes(slot)) this.replace(slot, { ok: false, error: { code: "internal", message: "the checker stopped unexpectedly on this request" } });
    });
    worker.unref();
    return slot;
  }

  private finish(slot: Slot, outcome: VerbOutcome): void {
    if (slot.timer) clearTimeout(slot.timer);
    const job = slot.job;
    slot.job = null;
    slot.timer = null;
    job?.resolve(outcome);
    this.dispatch();
  }

  /** Answers the slot's job (if any) with `outcome`, retires its worker and starts a fresh one. */
  private replace(slot: Slot, outcome: VerbOutcome): void {
    const index = this.slots.indexOf(slot);
    if (index < 0) return;
    if (slot.timer) clearTimeout(slot.timer);
    const job = slot.job;
    slot.job = null;
    this.slots.splice(index, 1);
    void slot.worker.terminate();
    job?.resolve(outcome);
    if (!slot.ready) this.failedStarts += 1;
    if (this.failedStarts >= 3) {
      console.error("cas workers fail to start; requests are refused until restart");
      for (const waiting of this.queue.splice(0)) waiting.resolve({ ok: false, error: { code: "internal", message: "the checker could not start" } });
      if (this.slots.length === 0) this.closed = true;
      return;
    }
    if (!this.closed) this.slots.push(this.spawn());
    this.dispatch();
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (!slot.ready || slot.job || this.queue.length === 0) continue;
      const job = this.queue.shift()!;
      slot.job = job;
      slot.timer = setTimeout(() => this.replace(slot, { ok: false, error: timeoutError(job.timeLimitMs) }), job.timeLimitMs);
      slot.worker.postMessage({ id: job.id, verb: job.verb, input: job.input });
    }
    // Keep the process alive only while work is pending.
    const busy = this.queue.length > 0 || this.slots.some((s) => s.job);
    for (const slot of this.slots) {
      if (busy) slot.worker.ref();
      else slot.worker.unref();
    }
  }
}

const GLOBAL_KEY = Symbol.for("vierbein.casPool");

/** The process-wide pool (two warm workers), kept on globalThis so hot reload does not start a second one. */
export function sharedCasPool(): NodeCasPool {
  const g = globalThis as unknown as Record<symbol, NodeCasPool | undefined>;
  return (g[GLOBAL_KEY] ??= new NodeCasPool({ size: 2 }));
}
