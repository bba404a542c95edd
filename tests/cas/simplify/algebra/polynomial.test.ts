import { describe, expect, it } from "vitest";
import { polyAdd, polyDivExact, polyMul, polyPow, polyVar, polyIsZero, polySub } from "@/cas/simplify/algebra/polynomial";
import { Ring } from "@/cas/simplify/algebra/ring";
import { q, qFromDecimal } from "@/cas/simplify/algebra/rational-number";

describe("polynomials", () => {
  const x = polyVar(0), y = polyVar(1);
  it("divides exactly, and says so when it cannot", () => {
    const p = polyMul(polyAdd(x, y), polySub(x, y)); // x² − y²
    const quotient = polyDivExact(p, polySub(x, y));
    expect(quotient && polyIsZero(polySub(quotient, polyAdd(x, y)))).toBe(true);
    expect(polyDivExact(polyAdd(polyPow(x, 2), y), polyAdd(x, y))).toBeNull();
  });

  it("reduces cos² to 1 − sin² so sin² + cos² − 1 is the zero polynomial", () => {
    const ring = new Ring();
    const s = polyVar(ring.variable({ kind: "sin", arg: "theta" }));
    const c = polyVar(ring.variable({ kind: "cos", arg: "theta" }));
    const one = new Map([["", q(1n)]]);
    expect(polyIsZero(ring.reduce(polySub(polyAdd(polyPow(s, 2), polyPow(c, 2)), one)))).toBe(true);
    expect(polyIsZero(ring.reduce(polySub(polyPow(c, 4), polyPow(polySub(one, polyPow(s, 2)), 2))))).toBe(true);
  });

  it("reads decimal literals exactly", () => {
    expect(qFromDecimal("6.674e-11")).toEqual(q(6674n, 10n ** 14n));
    expect(qFromDecimal("0.5")).toEqual(q(1n, 2n));
  });
});
