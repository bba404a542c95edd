import { describe, expect, it } from "vitest";
import { solveFor } from "../../../cas/numeric/solve";
import { decimalContext } from "../../../cas/numeric/evaluate";
import { readPlainExpr } from "../../../cas/parse/plain";

const D = decimalContext(50);
const e = readPlainExpr;

describe("solveFor", () => {
  it("finds √2 to the working precision (closed form for a quadratic)", () => {
    const p = solveFor(D, e("x^2"), e("2"), e("2*x"), "x", { x: new D(1) })!;
    // √2 to 40 digits — common knowledge, e.g. OEIS A002193.
    expect(p.x.toSignificantDigits(40).toString()).toBe("1.41421356237309504880168872420969807857");
  });

  it("takes the root nearer the start", () => {
    expect(solveFor(D, e("x^2"), e("4"), e("2*x"), "x", { x: new D(-3) })!.x.toNumber()).toBe(-2);
  });

  it("solves a transcendental relation by Newton's method: x e^x = 1 is the omega constant", () => {
    const p = solveFor(D, e("x*exp(x)"), e("1"), e("exp(x) + x*exp(x)"), "x", { x: new D(1) })!;
    // Omega constant 0.5671432904097838729999686622… (OEIS A030178).
    expect(p.x.toSignificantDigits(25).toString()).toBe("0.5671432904097838729999687");
  });

  it("gives null when there is no real root", () => {
    expect(solveFor(D, e("x^2"), e("-1"), e("2*x"), "x", { x: new D(1) })).toBeNull();
    expect(solveFor(D, e("exp(x)"), e("-1"), e("exp(x)"), "x", { x: new D(1) })).toBeNull();
  });
});
