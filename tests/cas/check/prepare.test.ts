import { describe, expect, it } from "vitest";
import { prepareProblem } from "../../../cas/check/prepare";
import { Undecidable } from "../../../cas/check/errors";
import { readPlain } from "../../../cas/parse/plain";
import { randomStream } from "../../../cas/numeric/random";
import { freeVariables } from "../../../cas/expr/traverse";
import { evaluateFloat } from "../../../cas/numeric/evaluate";
import type { Relation } from "../../../cas/expr/types";

const rel = (s: string) => readPlain(s) as Relation;
const ctx = (definitions: string[] = [], assumptions: string[] = []) => ({ definitions: definitions.map(rel), assumptions: assumptions.map(rel), parameter: "tau" });

describe("prepareProblem", () => {
  it("substitutes definitions, also through each other", () => {
    const p = prepareProblem([readPlain("E")], ctx(["E = mu*c^2*A", "A = 1 - r_s/r"]), randomStream(1));
    expect([...freeVariables(p.statements[0])].sort()).toEqual(["c", "mu", "r", "r_s"]);
  });

  it("refuses circular definitions", () => {
    expect(() => prepareProblem([readPlain("E")], ctx(["E = 2*L", "L = E/2"]), randomStream(1))).toThrow(Undecidable);
  });

  it("turns θ = π/2 into fixed values, with θ̇ = dθ = 0 for a coordinate along the curve", () => {
    const p = prepareProblem([readPlain("r^2*d(theta)^2 + sin(theta)^2*d(phi)^2")], ctx([], ["theta = pi/2", "r > r_s"]), randomStream(1));
    expect(p.fixed.map((f) => f.variable)).toEqual(["theta", "theta_dot", "theta_ddot", "d_theta"]);
    expect(p.conditions).toHaveLength(1);
  });

  it("replaces an undetermined function consistently, with its derivative", () => {
    const p = prepareProblem([readPlain("diff(A(r), r) = A(r)")], { ...ctx(), coordinates: ["r"] }, randomStream(2));
    const s = p.statements[0] as Relation;
    const formula = readPlain(p.functions.A.replace(/x1/g, "r"));
    const h = 1e-6;
    const at = (r: number) => evaluateFloat(formula as never, { values: { r } });
    expect(evaluateFloat(s.lhs, { values: { r: 1.3 } })).toBeCloseTo((at(1.3 + h) - at(1.3 - h)) / (2 * h), 5);
    expect(evaluateFloat(s.rhs, { values: { r: 1.3 } })).toBeCloseTo(at(1.3), 12);
  });

  it("writes dx as ẋ dτ once a step mixes differentials and dots (dividing by dτ²)", () => {
    const p = prepareProblem([readPlain("d(r)^2 = c^2*d(tau)^2"), readPlain("dot(r)^2 = c^2")], ctx(), randomStream(3));
    expect([...freeVariables(p.statements[0])].sort()).toEqual(["c", "d_tau", "r_dot"]);
  });
});
