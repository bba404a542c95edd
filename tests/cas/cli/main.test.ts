import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { STEP_CORPUS } from "../check/step-corpus";

function cas(args: string[], stdin: string) {
  const run = spawnSync(process.execPath, ["--import", "tsx", "cas/cli/main.ts", ...args], { input: stdin, encoding: "utf8", cwd: process.cwd(), timeout: 60_000 });
  return { code: run.status, out: run.stdout.trim(), json: run.stdout.trim() ? JSON.parse(run.stdout.trim()) : null, err: run.stderr };
}

describe("npm run -s cas -- check / dims (issue 3, item 6)", () => {
  it("prints a verified verdict and exits 0", () => {
    const r = cas(["check"], JSON.stringify(STEP_CORPUS.find((s) => s.id === "multiply-through")!.request));
    expect(r.code).toBe(0);
    expect(r.json.verdict).toBe("verified");
    expect(r.out.split("\n")).toHaveLength(1);
  });

  it("prints a refuted verdict with a witness and still exits 0", () => {
    const r = cas(["check"], JSON.stringify(STEP_CORPUS.find((s) => s.id === "multiply-through-power")!.request));
    expect(r.code).toBe(0);
    expect(r.json.verdict).toBe("refuted");
    expect(Object.keys(r.json.witness).length).toBeGreaterThan(0);
  });

  it("exits 2 with {error} for malformed JSON, a malformed request, unreadable LaTeX and an unknown verb", () => {
    for (const [args, stdin, code] of [
      [["check"], "{not json", "malformed"],
      [["check"], JSON.stringify({ context: {}, to: 1 }), "malformed"],
      [["check"], JSON.stringify({ context: {}, from: "x", to: "\\left(x" }), "unreadable"],
      [["nonsense"], "{}", "unknown_verb"],
      [[], "{}", "malformed"],
    ] as const) {
      const r = cas([...args], stdin);
      expect(r.code, r.out).toBe(2);
      expect(r.json.error.code).toBe(code);
    }
  });

  it("exits 3 with a timeout error when the time limit runs out", () => {
    const r = cas(["check", "--time-limit=1"], JSON.stringify(STEP_CORPUS.find((s) => s.id === "el-r")!.request));
    expect(r.code).toBe(3);
    expect(r.json.error.code).toBe("timeout");
  });

  it("audits dimensions and points at the odd term", () => {
    const r = cas(["dims"], JSON.stringify({ context: { symbols: { E: "energy", "\\mu": "mass", r: "length" } }, relation: "E = \\mu c^2 + \\mu r" }));
    expect(r.code).toBe(0);
    expect(r.json).toMatchObject({ consistent: false, odd: 2 });
    expect(r.json.terms[1]).toEqual({ latex: "\\mu c^{2}", dimension: "M L^2 T^-2" });
  });

  it("probes a limit: the redshift factor √(1 − 2GM/(rc²)) → 1 as c → ∞ (Hartle (2003) §9.2, section from memory), and lists the verb", () => {
    const r = cas(["limit"], JSON.stringify({ context: {}, expression: "\\sqrt{1-\\frac{2GM}{rc^2}}", parameter: "c", target: "infinity" }));
    expect(r.code).toBe(0);
    expect(r.json.sides[0].estimate).toMatchObject({ kind: "converges", value: "1" });
    expect(r.json.note).toMatch(/not a proof/);
    expect(cas(["nonsense"], "{}").json.error.message).toMatch(/\blimit\b/);
  });

  it("is what `npm run -s cas` runs", () => {
    const run = spawnSync("npm", ["run", "-s", "cas", "--", "dims"], { input: JSON.stringify({ context: { symbols: { r: "length" } }, relation: "r = r" }), encoding: "utf8", timeout: 60_000 });
    expect(run.status).toBe(0);
    expect(JSON.parse(run.stdout).consistent).toBe(true);
  });
});
