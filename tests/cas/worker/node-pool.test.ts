import { afterAll, describe, expect, it } from "vitest";
import { NodeCasPool } from "../../../cas/worker/node-pool";
import { STEP_CORPUS } from "../check/step-corpus";

const pool = new NodeCasPool({ size: 1 });
afterAll(() => pool.close());

const ordinary = { context: {}, from: "(a+b)^2", to: "a^2+2ab+b^2" };

async function expectNextAnswered() {
  const next = await pool.run("check", ordinary);
  expect(next).toMatchObject({ ok: true, value: { verdict: "verified" } });
}

describe("NodeCasPool with hostile input (issue 3, item 5)", () => {
  const hostile: [string, unknown, string][] = [
    ["a huge power in LaTeX", { context: {}, from: "(x+1)^{100000}", to: "x" }, "too_large"],
    ["a huge power in plain syntax", { context: {}, from: "(x+1)^100000", to: "x", syntax: "plain" }, "too_large"],
    ["10,000-deep nesting", { context: {}, from: "(".repeat(10_000) + "x" + ")".repeat(10_000), to: "x" }, "too_large"],
    ["5,000-deep nesting under the length cap", { context: {}, from: "\\left(".repeat(2_000) + "x" + "\\right)".repeat(2_000), to: "x" }, "too_large"],
    ["a 1 MB string", { context: {}, from: "x".repeat(1 << 20), to: "x" }, "too_large"],
    ["unreadable LaTeX", { context: {}, from: "\\frac{1}{", to: "x" }, "unreadable"],
    ["a malformed request", { context: {}, to: 3 }, "malformed"],
  ];
  for (const [name, input, code] of hostile) {
    it(`${name}: a clear error, then the next request is answered`, async () => {
      const out = await pool.run("check", input);
      expect(out.ok).toBe(false);
      if (!out.ok) {
        expect(out.error.code).toBe(code);
        expect(out.error.message.length).toBeGreaterThan(10);
      }
      await expectNextAnswered();
    });
  }

  it("stops a request over its time limit, answers timeout, and serves the next one from a fresh worker", async () => {
    const heavy = STEP_CORPUS.find((s) => s.id === "el-r")!.request;
    const out = await pool.run("check", heavy, 1);
    expect(out).toMatchObject({ ok: false, error: { code: "timeout" } });
    await expectNextAnswered();
  });

  it("answers an unknown verb with unknown_verb", async () => {
    expect(await pool.run("nonsense", {})).toMatchObject({ ok: false, error: { code: "unknown_verb" } });
  });

  it("serves the dims verb", async () => {
    const out = await pool.run("dims", { context: { symbols: { E: "energy", "\\mu": "mass" } }, relation: "E = \\mu c^2" });
    expect(out).toMatchObject({ ok: true, value: { consistent: true } });
  });
});
