import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { evaluateDecimal, type DecimalContext } from "./evaluate";
import { residual, relativeSize, zeroTolerance } from "./residual";
import type { Point } from "./sample";

/**
 * Solves `lhs = rhs` for one variable by Newton's method in decimal.js, the
 * other variables held at their values in `point`. `derivative` is d(lhs − rhs)/d(variable),
 * computed symbolically by the caller once per step. Starts from the point's own
 * value of the variable, then from a few scaled and sign-flipped guesses. Returns
 * the point with the variable replaced, or null when no start converges (for
 * instance ṙ² = a negative number has no real root there).
 *
 * @example
 * solveFor(D, parsePlain("x^2"), parsePlain("2"), parsePlain("2*x"), "x", { x: new D(1) }) // { x: 1.41421356… }
 */
export function solveFor(D: DecimalContext, lhs: Expr, rhs: Expr, derivative: Expr, variable: string, point: Point): Point | null {
  const start = point[variable] ?? new D(1);
  const starts = [start, start.times(2), start.div(2), start.neg(), start.times(10), new D(1), new D(-1)];
  const stepTolerance = new D(10).pow(-(D.precision - 6));
  const tolerance = zeroTolerance(D);
  for (const x0 of starts) {
    let x = x0;
    for (let i = 0; i < 80; i += 1) {
      const at: Point = { ...point, [variable]: x };
      let f: Decimal;
      let df: Decimal;
      try {
        const r = residual(D, lhs, rhs, at);
        if (relativeSize(r).lte(tolerance)) return at; // already on the surface (or the relation is an identity)
        f = r.value;
        df = evaluateDecimal(D, derivative, { values: at });
      } catch {
        break;
      }
      if (df.isZero()) break;
      const dx = f.div(df);
      // Damp wild steps so a root on the far side of a pole is not overshot.
      const limit = x.abs().plus(1).times(4);
      x = x.minus(dx.abs().gt(limit) ? limit.times(dx.s) : dx);
      if (dx.abs().lte(stepTolerance.times(x.abs().plus(stepTolerance)))) {
        const solved: Point = { ...point, [variable]: x };
        try {
          if (relativeSize(residual(D, lhs, rhs, solved)).lte(tolerance)) return solved;
        } catch {
          /* try the next start */
        }
        break;
      }
    }
  }
  return null;
}
