// The browser checker's bookkeeping, with a stand-in Worker (a real Web Worker needs a browser;
// the e2e suite covers that). The stand-in answers through runVerb, or never, to exercise time-outs.
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { runVerb } from "../../../cas/api/index";

class FakeWorker {
  static created = 0;
  static hang = false;
  /** How long the stand-in takes to "load" before it says it is ready; null: never. */
  static startupMs: number | null = 0;
  terminated = false;
  onmessage: ((e: MessageEvent) => void) | null = null;
  onerror: ((e: Event) => void) | null = null;
  constructor() {
    FakeWorker.created += 1;
    if (FakeWorker.startupMs !== null) setTimeout(() => { if (!this.terminated) this.onmessage?.({ data: { ready: true } } as MessageEvent); }, FakeWorker.startupMs);
  }
  postMessage(data: { id: number; verb: string; input: unknown }) {
    if (FakeWorker.hang) return;
    setTimeout(() => { if (!this.terminated) this.onmessage?.({ data: { id: data.id, outcome: runVerb(data.verb, data.input) } } as MessageEvent); }, 0);
  }
  terminate() { this.terminated = true; }
}

beforeEach(() => {
  FakeWorker.created = 0;
  FakeWorker.hang = false;
  FakeWorker.startupMs = 0;
  vi.stubGlobal("window", {});
  vi.stubGlobal("Worker", FakeWorker);
});
afterEach(() => vi.unstubAllGlobals());

const { createBrowserChecker } = await import("../../../cas/worker/browser-client");

describe("createBrowserChecker", () => {
  it("answers a check through the worker", async () => {
    const checker = createBrowserChecker();
    const answer = await checker.check({ context: {}, from: "(a+b)^2", to: "a^2+2ab+b^2" });
    expect(answer).toMatchObject({ verdict: "verified" });
    checker.dispose();
  });

  it("answers a request over the time limit with a timeout and starts a fresh worker for the next", async () => {
    const checker = createBrowserChecker({ timeLimitMs: 20 });
    FakeWorker.hang = true;
    expect(await checker.check({ context: {}, from: "x", to: "x" })).toMatchObject({ error: { code: "timeout" } });
    FakeWorker.hang = false;
    expect(await checker.check({ context: {}, from: "x", to: "x" })).toMatchObject({ verdict: "verified" });
    expect(FakeWorker.created).toBe(2);
    checker.dispose();
  });

  it("does not charge a slow worker start to the first request's time limit", async () => {
    FakeWorker.startupMs = 60;
    const checker = createBrowserChecker({ timeLimitMs: 20 });
    expect(await checker.check({ context: {}, from: "(a+b)^2", to: "a^2+2ab+b^2" })).toMatchObject({ verdict: "verified" });
    checker.dispose();
  });

  it("gives up with a clear error when the worker never starts", async () => {
    FakeWorker.startupMs = null;
    FakeWorker.hang = true;
    const checker = createBrowserChecker({ timeLimitMs: 20, startupLimitMs: 50 });
    expect(await checker.check({ context: {}, from: "x", to: "x" })).toMatchObject({ error: { code: "internal", message: expect.stringMatching(/did not start/) } });
    checker.dispose();
  });

  it("cancels a running request on abort and passes refusals through", async () => {
    const checker = createBrowserChecker();
    FakeWorker.hang = true;
    const controller = new AbortController();
    const pending = checker.check({ context: {}, from: "x", to: "x" }, controller.signal);
    controller.abort();
    expect(await pending).toMatchObject({ error: { code: "aborted" } });
    FakeWorker.hang = false;
    expect(await checker.run("check", { context: {}, to: 1 })).toMatchObject({ error: { code: "malformed" } });
    checker.dispose();
  });

  it("refuses to start outside a browser", () => {
    vi.unstubAllGlobals();
    expect(() => createBrowserChecker()).toThrow(/browser only/);
  });
});
