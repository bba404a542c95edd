import { describe, expect, it } from "vitest";
import { polynomialDegree } from "../../../cas/check/degree";
import { readPlainExpr } from "../../../cas/parse/plain";

describe("polynomialDegree", () => {
  it("reads degrees and rejects non-polynomials (common algebra)", () => {
    const e = readPlainExpr("G*M*mu/r^2 - L^2/(mu*r^3) + 3*G*M*L^2/(mu*c^2*r^4)");
    expect(polynomialDegree(e, "L")).toBe(2);
    expect(polynomialDegree(e, "G")).toBe(1);
    expect(polynomialDegree(e, "mu")).toBeNull();
    expect(polynomialDegree(e, "r")).toBeNull();
    expect(polynomialDegree(readPlainExpr("sin(x)*y"), "x")).toBeNull();
    expect(polynomialDegree(readPlainExpr("sin(x)*y"), "y")).toBe(1);
  });
});
