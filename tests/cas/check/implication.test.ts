import { describe, expect, it } from "vitest";
import { probeImplication } from "../../../cas/check/implication";
import { readPlain } from "../../../cas/parse/plain";
import { randomStream } from "../../../cas/numeric/random";
import type { Relation } from "../../../cas/expr/types";

const rel = (s: string) => readPlain(s) as Relation;
const problem = (premises: string[], claim: string, conditions: string[] = [], signed: string[] = []) => ({
  premises: premises.map(rel), conditions: conditions.map(rel), fixed: [], signed: new Set(signed), claim: rel(claim),
});

describe("probeImplication", () => {
  it("verifies a rearrangement and a non-zero multiple (common algebra, no source)", () => {
    expect(probeImplication(problem(["x = 2*y + 1"], "x - 1 = 2*y"), randomStream(1)).verdict).toBe("verified");
    expect(probeImplication(problem(["x = 2*y + 1"], "3*x - 3 = 6*y"), randomStream(2)).verdict).toBe("verified");
  });

  it("verifies squaring, which only follows one way (common algebra, no source)", () => {
    expect(probeImplication(problem(["v = sqrt(a)"], "v^2 = a"), randomStream(3)).verdict).toBe("verified");
  });

  it("refutes taking a square root without a sign condition, and verifies it with one", () => {
    const unsigned = probeImplication(problem(["v^2 = a"], "v = sqrt(a)", [], ["v"]), randomStream(4));
    expect(unsigned.verdict).toBe("refuted");
    const signed = probeImplication(problem(["v^2 = a"], "v = sqrt(a)", ["v > 0"], ["v"]), randomStream(4));
    expect(signed.verdict).toBe("verified");
  });

  it("refutes a wrong consequence with a witness on the premise surface", () => {
    const out = probeImplication(problem(["x = 2*y"], "x = y"), randomStream(5));
    expect(out.verdict).toBe("refuted");
    if (out.verdict === "refuted") expect(Number(out.witness.x)).toBeCloseTo(2 * Number(out.witness.y), 12);
  });

  it("solves a relation with no closed form by Newton's method", () => {
    expect(probeImplication(problem(["x*exp(x) = y"], "log(x) + x = log(y)"), randomStream(6)).verdict).toBe("verified");
  });

  it("checks inequalities as claims", () => {
    expect(probeImplication(problem([], "x^2 + 1 > 0"), randomStream(7)).verdict).toBe("verified");
    expect(probeImplication(problem([], "r_s/r < 1", ["r > r_s"]), randomStream(7)).verdict).toBe("verified");
    expect(probeImplication(problem([], "r_s/r > 1", ["r > r_s"]), randomStream(7)).verdict).toBe("refuted");
  });

  it("is undecided when no point satisfies the premises", () => {
    const out = probeImplication(problem(["v^2 = -1 - a"], "v = 0", ["a > 0"], ["v"]), randomStream(8));
    expect(out.verdict).toBe("undecided");
  });
});
