import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { CheckAnswer, CheckError, CheckRequest } from "@/cas/check/protocol";
import type { StepCheckPlan } from "@/editor/check-request";
import { CheckScheduler, type StepChecker } from "@/editor/step-checker";
import type { StepVerdict } from "@/editor/step-verdicts";

/** A checker the test answers by hand, to control timing and order. */
function manualChecker() {
  const calls: Array<{ request: CheckRequest; signal?: AbortSignal; resolve: (a: CheckAnswer | CheckError) => void; reject: (e: unknown) => void }> = [];
  const checker: StepChecker = {
    check: (request, signal) => new Promise((resolve, reject) => calls.push({ request, signal, resolve, reject })),
  };
  return { checker, calls };
}

const verified: CheckAnswer = { verdict: "verified", method: { kind: "numeric", points: 12, digits: 30 } };
const refuted: CheckAnswer = { verdict: "refuted", method: { kind: "numeric", points: 12, digits: 30 }, witness: { r: "3.1" } };
const plan = (to: string): StepCheckPlan => ({ request: { context: {}, from: "a = b", to } });

describe("CheckScheduler", () => {
  let seen: Array<readonly [string, StepVerdict]>;
  beforeEach(() => {
    vi.useFakeTimers();
    seen = [];
  });
  afterEach(() => vi.useRealTimers());
  const flush = () => vi.advanceTimersByTimeAsync(0);

  it("waits for the quiet period and plans only once for a burst of edits", async () => {
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => seen.push(...v), debounceMs: 300 });
    const planner = vi.fn(() => new Map([["st-a", plan("a = c")]]));
    scheduler.schedule(planner);
    await vi.advanceTimersByTimeAsync(200);
    scheduler.schedule(planner);
    await vi.advanceTimersByTimeAsync(200);
    expect(planner).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(100);
    expect(planner).toHaveBeenCalledTimes(1);
    expect(calls).toHaveLength(1);
    expect(seen).toEqual([["st-a", { state: "pending" }]]);
    calls[0].resolve(verified);
    await flush();
    expect(seen.at(-1)).toEqual(["st-a", { state: "answered", answer: verified }]);
  });

  it("drops the answer to a request that changed meanwhile, and aborts it", async () => {
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => seen.push(...v) });
    scheduler.apply(new Map([["st-a", plan("a = c")]]));
    scheduler.apply(new Map([["st-a", plan("a = d")]]));
    expect(calls[0].signal?.aborted).toBe(true);
    calls[0].resolve(verified); // stale: must not show
    calls[1].resolve(refuted);
    await flush();
    expect(seen.filter(([, v]) => v.state === "answered")).toEqual([["st-a", { state: "answered", answer: refuted }]]);
  });

  it("does not re-send an unchanged request, answers repeats from its cache, and reports not-checked steps", async () => {
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => seen.push(...v) });
    scheduler.apply(new Map([["st-a", plan("a = c")], ["st-b", { notChecked: "empty" }]]));
    calls[0].resolve(verified);
    await flush();
    scheduler.apply(new Map([["st-a", plan("a = c")], ["st-b", { notChecked: "empty" }]]));
    expect(calls).toHaveLength(1);
    scheduler.apply(new Map([["st-c", plan("a = c")]])); // same request under another step
    expect(calls).toHaveLength(1);
    expect(seen.at(-1)).toEqual(["st-c", { state: "answered", answer: verified }]);
    expect(seen).toContainEqual(["st-b", { state: "not-checked", reason: "empty" }]);
  });

  it("re-shows a known verdict for a step the margin shows as pending after an undone edit", async () => {
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => seen.push(...v) });
    scheduler.apply(new Map([["st-a", plan("a = c")]]));
    calls[0].resolve(verified);
    await flush();
    seen = [];
    scheduler.apply(new Map([["st-a", plan("a = c")]]), new Map([["st-a", { state: "pending" } as StepVerdict]]));
    expect(seen).toEqual([["st-a", { state: "answered", answer: verified }]]);
  });

  it("reports a checker that fails as failed (shown as undecided), not as a verdict", async () => {
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => seen.push(...v) });
    scheduler.apply(new Map([["st-a", plan("a = c")]]));
    calls[0].reject(new Error("worker crashed"));
    await flush();
    calls[1].reject(new Error("worker crashed")); // retried once, then reported
    await flush();
    expect(calls).toHaveLength(2);
    expect(seen.at(-1)).toEqual(["st-a", { state: "failed", error: { code: "unavailable:checker", message: "worker crashed" } }]);
  });

  it("runs at most `concurrency` checks at once", async () => {
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: () => {}, concurrency: 2 });
    scheduler.apply(new Map(["a", "b", "c"].map((id) => [id, plan(`${id} = 1`)])));
    expect(calls).toHaveLength(2);
    calls[0].resolve(verified);
    await flush();
    expect(calls).toHaveLength(3);
  });

  it("ignores everything after dispose", async () => {
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => seen.push(...v) });
    scheduler.apply(new Map([["st-a", plan("a = c")]]));
    scheduler.dispose();
    calls[0].resolve(verified);
    await flush();
    expect(seen).toEqual([["st-a", { state: "pending" }]]);
  });
});

describe("CheckScheduler with a transient failure", () => {
  it("retries a timed-out check once and does not cache the timeout", async () => {
    vi.useFakeTimers();
    const seen: Array<readonly [string, StepVerdict]> = [];
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => seen.push(...v) });
    scheduler.apply(new Map([["st-a", plan("a = c")]]));
    calls[0].resolve({ error: { code: "timeout", message: "took too long" } });
    await vi.advanceTimersByTimeAsync(0);
    expect(calls).toHaveLength(2);
    calls[1].resolve(verified);
    await vi.advanceTimersByTimeAsync(0);
    expect(seen.at(-1)).toEqual(["st-a", { state: "answered", answer: verified }]);
    vi.useRealTimers();
  });

  it("keeps an unreadable step's error (not transient) without asking again", async () => {
    const seen: Array<readonly [string, StepVerdict]> = [];
    const { checker, calls } = manualChecker();
    const scheduler = new CheckScheduler({ checker, onVerdicts: (v) => seen.push(...v) });
    scheduler.apply(new Map([["st-a", plan("a = \\foo")]]));
    calls[0].resolve({ error: { code: "unreadable", message: "unknown command \\foo" } });
    await new Promise((r) => setTimeout(r, 0));
    scheduler.apply(new Map([["st-a", plan("a = \\foo")]]));
    expect(calls).toHaveLength(1);
    expect(seen.at(-1)?.[1].state).toBe("failed");
  });
});
