// Cross-check: SymPy (Debian python3-sympy) decides the same corpus steps on its
// own — simplify(lhs − rhs) == 0, solve() on the previous step, its own
// Euler–Lagrange expression and limit() — and must agree with the checker.
import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { checkStep } from "../../../cas/check/check";
import { STEP_CORPUS } from "../check/step-corpus";
import { runSympy, sympyJob } from "./sympy-reference";

const sympyAvailable = spawnSync("python3", ["-c", "import sympy"]).status === 0;

describe.skipIf(!sympyAvailable)("verdicts against SymPy as the reference", () => {
  it("agrees with SymPy on every corpus step SymPy can decide", { timeout: 600_000 }, () => {
    const jobs = STEP_CORPUS.map(sympyJob).filter((j): j is Record<string, unknown> => j !== null);
    expect(jobs.length).toBeGreaterThanOrEqual(40);
    const results = runSympy(jobs);
    expect(results).toHaveLength(jobs.length);
    const disagreements: string[] = [];
    for (const r of results) {
      const step = STEP_CORPUS.find((s) => s.id === r.id)!;
      const ours = checkStep(step.request).verdict;
      if (r.verdict !== ours) disagreements.push(`${r.id}: SymPy ${r.verdict}, checker ${ours}`);
    }
    expect(disagreements).toEqual([]);
  });

  it("would notice a disagreement: SymPy refutes a broken twin the checker is asked about", () => {
    const broken = STEP_CORPUS.find((s) => s.id === "energy-form-lost-c2")!;
    const [result] = runSympy([sympyJob(broken)!]);
    expect(result.verdict).toBe("refuted");
  });
});
