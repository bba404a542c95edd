import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { evaluateDecimal, type DecimalContext } from "../numeric/evaluate";
import { signedTerms } from "../numeric/residual";
import type { Point } from "../numeric/sample";

/**
 * How large the numbers that went into `e` were: |e| evaluated with every sum
 * replaced by the sum of its parts' sizes. A claim such as
 * `μ/2·(−(A + B)) = 0` with A ≈ −B is zero to within rounding relative to |A|,
 * not relative to its own tiny value; the top-level terms alone would miss the
 * cancellation inside the product and refute a correct step.
 *
 * A bound for rounding only: it may overestimate (a function's argument counts
 * at its own size), which makes "equal within rounding" a little more lenient,
 * never a real difference of order one disappear.
 *
 * @example
 * magnitude(D, parsePlain("mu*(a - b)"), { mu: 2, a: 1, b: 1 }) // 4 (|μ|·(|a| + |b|)), where the value is 0
 */
export function magnitude(D: DecimalContext, e: Expr, point: Point): Decimal {
  const value = () => evaluateDecimal(D, e, { values: point }).abs();
  switch (e.kind) {
    case "add":
      return e.terms.reduce((sum, t) => sum.plus(magnitude(D, t, point)), new D(0));
    case "neg":
      return magnitude(D, e.arg, point);
    case "mul":
      return e.factors.reduce((product, f) => product.times(magnitude(D, f, point)), new D(1));
    case "div": {
      const den = evaluateDecimal(D, e.den, { values: point }).abs();
      return den.isZero() ? value() : magnitude(D, e.num, point).div(den);
    }
    case "pow": {
      const n = e.exp.kind === "num" ? Number(e.exp.value) : NaN;
      if (Number.isInteger(n) && n > 0 && n <= 64) return magnitude(D, e.base, point).pow(n);
      return value();
    }
    case "call": {
      const own = value();
      const args = e.args.reduce((sum, a) => sum.plus(magnitude(D, a, point)), new D(0));
      const inner = e.fn === "sqrt" ? args.sqrt() : args;
      return D.max(own, inner);
    }
    default:
      return value();
  }
}

/**
 * `lhs − rhs` at a point with the scale of everything that cancelled in it
 * (see {@link magnitude}), for deciding whether a claim holds to within rounding.
 *
 * @example
 * claimResidual(D, parsePlain("mu*(a - b)"), parsePlain("0"), point) // { value: 0, scale: 4 }
 */
export function claimResidual(D: DecimalContext, lhs: Expr, rhs: Expr, point: Point): { value: Decimal; scale: Decimal } {
  let value = new D(0);
  let scale = new D(0);
  for (const { sign, term } of [...signedTerms(lhs), ...signedTerms(rhs, -1)]) {
    const v = evaluateDecimal(D, term, { values: point });
    value = sign > 0 ? value.plus(v) : value.minus(v);
    scale = scale.plus(D.max(v.abs(), magnitude(D, term, point)));
  }
  return { value, scale };
}
