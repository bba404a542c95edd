import { describe, expect, it } from "vitest";
import { eulerLagrange } from "../../../cas/check/euler-lagrange";
import { readPlainExpr } from "../../../cas/parse/plain";
import { evaluateFloat } from "../../../cas/numeric/evaluate";
import { dotVariable } from "../../../cas/expr/types";

const values = { r: 1.7, phi: 0.4, [dotVariable("r", 1)]: 0.3, [dotVariable("phi", 1)]: 0.9, [dotVariable("r", 2)]: -0.2, [dotVariable("phi", 2)]: 0.05, k: 2.5 };

describe("eulerLagrange", () => {
  it("gives d/dτ(2r²φ̇) for L = r²φ̇² (Carroll (2004) §5.4: φ cyclic, r²φ̇ conserved)", () => {
    const el = eulerLagrange(readPlainExpr("r^2*dot(phi)^2"), "phi", "tau", ["r", "phi"]);
    const expected = 4 * values.r * values.r_ddot * 0 + 4 * values.r * values[dotVariable("r", 1)] * values[dotVariable("phi", 1)] + 2 * values.r ** 2 * values[dotVariable("phi", 2)];
    expect(evaluateFloat(el, { values })).toBeCloseTo(expected, 12);
  });

  it("gives m r̈ + k r for the oscillator L = ½ṙ² − ½k r² (textbook mechanics, common practice)", () => {
    const el = eulerLagrange(readPlainExpr("dot(r)^2/2 - k*r^2/2"), "r", "tau", ["r"]);
    expect(evaluateFloat(el, { values })).toBeCloseTo(values[dotVariable("r", 2)] + values.k * values.r, 12);
  });
});
