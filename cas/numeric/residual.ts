import Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { evaluateDecimal, type DecimalContext } from "./evaluate";
import type { Point } from "./sample";

/** The top-level additive terms of `e`, each with its sign (`a - (b + c)` → +a, −b, −c). */
export function signedTerms(e: Expr, sign = 1): { sign: number; term: Expr }[] {
  if (e.kind === "add") return e.terms.flatMap((t) => signedTerms(t, sign));
  if (e.kind === "neg") return signedTerms(e.arg, -sign);
  return [{ sign, term: e }];
}

/**
 * `lhs - rhs` at a point together with its scale, the sum of the absolute
 * values of the top-level terms: a difference is "zero" relative to the size of
 * what cancelled, not relative to itself.
 *
 * @example
 * residual(D, parsePlain("x^2"), parsePlain("x*x"), { x: new D(3) }) // { value: 0, scale: 18 }
 */
export function residual(D: DecimalContext, lhs: Expr, rhs: Expr, point: Point): { value: Decimal; scale: Decimal } {
  let value = new D(0);
  let scale = new D(0);
  const terms = [...signedTerms(lhs), ...signedTerms(rhs, -1)];
  for (const { sign, term } of terms) {
    const v = evaluateDecimal(D, term, { values: point });
    value = sign > 0 ? value.plus(v) : value.minus(v);
    scale = scale.plus(v.abs());
  }
  return { value, scale };
}

/** |value| / scale, with 0/0 read as 0. */
export function relativeSize(r: { value: Decimal; scale: Decimal }): Decimal {
  if (r.scale.isZero()) return r.value.abs();
  return r.value.abs().div(r.scale);
}

/** The tolerance below which a relative difference counts as zero at `digits` significant digits (12 digits of headroom for rounding). */
export function zeroTolerance(D: DecimalContext): Decimal {
  return new D(10).pow(-(D.precision - 12));
}

/** Above this relative size a difference is certainly real, not rounding; between the two the checker declines to decide. */
export function clearDifference(D: DecimalContext): Decimal {
  return new D(10).pow(-Math.min(20, Math.floor(D.precision / 2)));
}

export { Decimal };
