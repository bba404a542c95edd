import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { evaluateDecimal, evaluateFloat, type DecimalContext } from "./evaluate";
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
 * `degree`, when the caller knows the relation is a polynomial of degree 1 or 2
 * in the variable (see polynomialDegree), lets the root come from two or three
 * evaluations instead of a probe of the shape.
 *
 * @example
 * solveFor(D, parsePlain("x^2"), parsePlain("2"), parsePlain("2*x"), "x", { x: new D(1) }) // { x: 1.41421356… }
 */
export function solveFor(D: DecimalContext, lhs: Expr, rhs: Expr, derivative: Expr, variable: string, point: Point, degree: number | null = null): Point | null {
  const start = point[variable] ?? new D(1);
  if (degree === 1 || degree === 2) {
    const exact = solveKnownPolynomial(D, lhs, rhs, variable, point, start, degree);
    if (exact !== undefined) return exact;
  }
  const quadratic = solveQuadratic(D, lhs, rhs, variable, point, start);
  if (quadratic !== undefined) return quadratic;
  const rough = floatNewton(lhs, rhs, derivative, variable, point, start.toNumber());
  const starts = rough === null ? [start, start.neg(), start.times(3), start.div(3)] : [new D(rough), start, start.neg()];
  const stepTolerance = new D(10).pow(-(D.precision - 6));
  const tolerance = zeroTolerance(D);
  for (const x0 of starts) {
    let x = x0;
    for (let i = 0; i < 40; i += 1) {
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

/**
 * Most relations in a derivation are linear or quadratic in the variable
 * solved for (ṙ², E², L²): detect that from four values and take the root in
 * closed form, the one nearer the drawn value. Returns undefined when the
 * relation is not a quadratic in the variable (Newton then runs), null when it
 * is one without a real root.
 */
function solveQuadratic(D: DecimalContext, lhs: Expr, rhs: Expr, variable: string, point: Point, start: Decimal): Point | null | undefined {
  const at = (v: Decimal | number) => residual(D, lhs, rhs, { ...point, [variable]: new D(v) });
  let f0, f1, fm, fs;
  try {
    [f0, f1, fm, fs] = [at(0), at(1), at(-1), at(start)];
  } catch {
    return undefined;
  }
  const a = f1.value.plus(fm.value).div(2).minus(f0.value);
  const b = f1.value.minus(fm.value).div(2);
  const c = f0.value;
  const predicted = a.times(start).times(start).plus(b.times(start)).plus(c);
  const scale = D.max(f0.scale, f1.scale, fm.scale, fs.scale);
  const tolerance = zeroTolerance(D).times(1e6).times(scale.isZero() ? 1 : scale);
  if (predicted.minus(fs.value).abs().gt(tolerance)) return undefined;
  let roots: Decimal[];
  if (a.abs().lte(tolerance)) {
    if (b.abs().lte(tolerance)) return c.abs().lte(tolerance) ? point : null;
    roots = [c.neg().div(b)];
  } else {
    const disc = b.times(b).minus(a.times(c).times(4));
    if (disc.isNegative()) return null;
    const root = disc.sqrt();
    roots = [b.neg().plus(root).div(a.times(2)), b.neg().minus(root).div(a.times(2))];
  }
  roots.sort((x, y) => x.minus(start).abs().cmp(y.minus(start).abs()));
  for (const x of roots) {
    const solved: Point = { ...point, [variable]: x };
    try {
      if (relativeSize(residual(D, lhs, rhs, solved)).lte(zeroTolerance(D))) return solved;
    } catch {
      /* the other root, or Newton */
    }
  }
  return undefined;
}

/** Newton's method in float64 from a few starts: cheap, and close enough that two or three decimal steps finish the root. */
function floatNewton(lhs: Expr, rhs: Expr, derivative: Expr, variable: string, point: Point, start: number): number | null {
  const values: Record<string, number> = {};
  for (const [k, v] of Object.entries(point)) values[k] = v.toNumber();
  for (const x0 of [start, -start, 3 * start, start / 3]) {
    let x = x0;
    for (let i = 0; i < 60; i += 1) {
      values[variable] = x;
      let f: number;
      let df: number;
      try {
        f = evaluateFloat(lhs, { values }) - evaluateFloat(rhs, { values });
        df = evaluateFloat(derivative, { values });
      } catch {
        break;
      }
      if (!Number.isFinite(f) || !Number.isFinite(df) || df === 0) break;
      const dx = f / df;
      const limit = 4 * (Math.abs(x) + 1);
      x -= Math.abs(dx) > limit ? Math.sign(dx) * limit : dx;
      if (Math.abs(dx) <= 1e-13 * (Math.abs(x) + 1e-300)) return x;
    }
  }
  return null;
}

/** The root of a relation known to be linear or quadratic in the variable: coefficients from values at 0, 1 (and −1). */
function solveKnownPolynomial(D: DecimalContext, lhs: Expr, rhs: Expr, variable: string, point: Point, start: Decimal, degree: 1 | 2): Point | null | undefined {
  const at = (v: number) => residual(D, lhs, rhs, { ...point, [variable]: new D(v) });
  try {
    const f0 = at(0);
    const f1 = at(1);
    const scale = D.max(f0.scale, f1.scale);
    const tiny = zeroTolerance(D).times(scale.isZero() ? 1 : scale);
    if (degree === 1) {
      const b = f1.value.minus(f0.value);
      if (b.abs().lte(tiny)) return f0.value.abs().lte(tiny) ? point : null;
      return { ...point, [variable]: f0.value.neg().div(b) };
    }
    const fm = at(-1);
    const a = f1.value.plus(fm.value).div(2).minus(f0.value);
    const b = f1.value.minus(fm.value).div(2);
    const c = f0.value;
    if (a.abs().lte(tiny)) return b.abs().lte(tiny) ? (c.abs().lte(tiny) ? point : null) : { ...point, [variable]: c.neg().div(b) };
    const disc = b.times(b).minus(a.times(c).times(4));
    if (disc.isNegative()) return null;
    const root = disc.sqrt();
    const roots = [b.neg().plus(root).div(a.times(2)), b.neg().minus(root).div(a.times(2))];
    roots.sort((x, y) => x.minus(start).abs().cmp(y.minus(start).abs()));
    return { ...point, [variable]: roots[0] };
  } catch {
    return undefined; // a value at 0 or ±1 is undefined there: fall back to the general path
  }
}
