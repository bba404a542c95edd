import { describe, expect, it } from "vitest";
import { claimResidual, magnitude } from "../../../cas/check/magnitude";
import { decimalContext } from "../../../cas/numeric/evaluate";
import { readPlain } from "../../../cas/parse/plain";
import type { Expr } from "../../../cas/expr/types";

const D = decimalContext(40);
const e = (s: string) => readPlain(s) as Expr;

describe("magnitude (common practice, no source: the size of what cancels bounds the rounding)", () => {
  it("counts the parts of a sum inside a product, not the cancelled value", () => {
    const point = { mu: new D(2), a: new D(1), b: new D(1) };
    expect(magnitude(D, e("mu*(a - b)"), point).toNumber()).toBe(4);
    expect(magnitude(D, e("(a - b)/mu"), point).toNumber()).toBe(1);
  });

  it("makes a product with a rounding-level factor zero relative to its parts, and keeps a real difference", () => {
    const third = new D(1).div(3);
    const point = { mu: new D(2), a: third, b: third.times(3).div(3) };
    const rounding = claimResidual(D, e("mu/2*(-(3*a - 1))"), e("0"), point);
    expect(rounding.value.abs().div(rounding.scale).toNumber()).toBeLessThan(1e-30);
    const real = claimResidual(D, e("mu/2*(-(3*a - 2))"), e("0"), point);
    expect(real.value.abs().div(real.scale).toNumber()).toBeGreaterThan(0.1);
  });
});
