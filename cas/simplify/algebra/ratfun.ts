import {
  type Poly, polyAdd, polyConst, polyDivExact, polyIsZero, polyMul, polyNeg, polyOne, polyPow, polyScale,
  polyDerivative, polyDependsOn, polyConstant,
} from "./polynomial";
import { type Q, q, qInv } from "./rational-number";
import type { Factors, Ring } from "./ring";

/**
 * A rational function num / ∏ factor^exponent over a {@link Ring}. The
 * numerator is kept reduced (cos-degree ≤ 1), so a zero function has the zero
 * numerator: that is how curvature comes out exactly 0.
 *
 * @example
 * const f = rfDiv(ring, rfVar(ring, r_s), rfVar(ring, r)); // r_s / r
 */
export interface RatFun { readonly num: Poly; readonly den: Factors }

const EMPTY: Factors = new Map();

export const rfZero = (): RatFun => ({ num: new Map(), den: EMPTY });
export const rfConst = (c: Q): RatFun => ({ num: polyConst(c), den: EMPTY });
export const rfOne = (): RatFun => ({ num: polyOne(), den: EMPTY });
export const rfPoly = (p: Poly): RatFun => ({ num: p, den: EMPTY });
export const rfIsZero = (a: RatFun) => polyIsZero(a.num);

/** The denominator expanded to one polynomial. */
export function denPoly(ring: Ring, den: Factors): Poly {
  let out = polyOne();
  for (const [id, e] of den) out = ring.reduce(polyMul(out, polyPow(ring.factors[id], e)));
  return out;
}

/** Divides out every denominator factor that divides the numerator. */
function cancel(ring: Ring, num: Poly, den: Factors): RatFun {
  if (polyIsZero(num)) return rfZero();
  if (den.size === 0) return { num, den };
  const out: Factors = new Map();
  for (const [id, e] of den) {
    let left = e;
    const f = ring.factors[id];
    while (left > 0) {
      const quotient = polyDivExact(num, f);
      if (quotient === null) break;
      num = quotient;
      left -= 1;
    }
    if (left > 0) out.set(id, left);
  }
  return { num, den: out };
}

export function rfNeg(a: RatFun): RatFun {
  return { num: polyNeg(a.num), den: a.den };
}

export function rfScale(a: RatFun, s: Q): RatFun {
  return { num: polyScale(a.num, s), den: a.den };
}

export function rfAdd(ring: Ring, a: RatFun, b: RatFun): RatFun {
  if (rfIsZero(a)) return b;
  if (rfIsZero(b)) return a;
  const lcm: Factors = new Map(a.den);
  for (const [id, e] of b.den) lcm.set(id, Math.max(e, lcm.get(id) ?? 0));
  const lift = (x: RatFun): Poly => {
    let p = x.num;
    for (const [id, e] of lcm) {
      const missing = e - (x.den.get(id) ?? 0);
      if (missing > 0) p = polyMul(p, polyPow(ring.factors[id], missing));
    }
    return p;
  };
  const num = ring.reduce(polyAdd(lift(a), lift(b)));
  return cancel(ring, num, lcm);
}

export function rfSub(ring: Ring, a: RatFun, b: RatFun): RatFun {
  return rfAdd(ring, a, rfNeg(b));
}

export function rfSum(ring: Ring, terms: RatFun[]): RatFun {
  return terms.reduce((acc, t) => rfAdd(ring, acc, t), rfZero());
}

export function rfMul(ring: Ring, a: RatFun, b: RatFun): RatFun {
  if (rfIsZero(a) || rfIsZero(b)) return rfZero();
  // Cancel crosswise first, while the polynomials are small.
  const ab = cancel(ring, a.num, b.den);
  const ba = cancel(ring, b.num, a.den);
  const den: Factors = new Map(ab.den);
  for (const [id, e] of ba.den) den.set(id, (den.get(id) ?? 0) + e);
  const ca = polyConstant(ab.num);
  const cb = polyConstant(ba.num);
  const num = ca !== null ? polyScale(ba.num, ca) : cb !== null ? polyScale(ab.num, cb) : ring.reduce(polyMul(ab.num, ba.num));
  return { num, den };
}

export function rfInv(ring: Ring, a: RatFun): RatFun {
  if (rfIsZero(a)) throw new RangeError("division by zero");
  const { content, factors } = ring.factorize(a.num, true);
  return { num: polyScale(denPoly(ring, a.den), qInv(content)), den: factors };
}

export function rfDiv(ring: Ring, a: RatFun, b: RatFun): RatFun {
  return rfMul(ring, a, rfInv(ring, b));
}

export function rfPow(ring: Ring, a: RatFun, n: number): RatFun {
  if (n < 0) return rfPow(ring, rfInv(ring, a), -n);
  let out = rfOne();
  for (let i = 0; i < n; i += 1) out = rfMul(ring, out, a);
  return out;
}

/** The constant value of a, or null. */
export function rfConstant(a: RatFun): Q | null {
  if (a.den.size > 0) return null;
  return polyConstant(a.num);
}

/**
 * Derivative of a rational function, given how each variable changes:
 * `variableDerivative(v)` is d(variable v)/d(whatever we differentiate by),
 * or null when it does not change.
 */
export function rfDerivative(ring: Ring, a: RatFun, variableDerivative: (v: number) => RatFun | null): RatFun {
  const dPoly = (p: Poly): RatFun => {
    let out = rfZero();
    for (let v = 0; v < ring.atoms.length; v += 1) {
      if (!polyDependsOn(p, v)) continue;
      const dv = variableDerivative(v);
      if (dv === null || rfIsZero(dv)) continue;
      out = rfAdd(ring, out, rfMul(ring, rfPoly(polyDerivative(p, v)), dv));
    }
    return out;
  };
  let out = rfMul(ring, dPoly(a.num), { num: polyOne(), den: a.den });
  for (const [id, e] of a.den) {
    const df = dPoly(ring.factors[id]);
    if (rfIsZero(df)) continue;
    // d(f^-e) = -e f' f^-(e+1): the term -e N f' / (D f)
    const den: Factors = new Map(a.den);
    den.set(id, e + 1);
    const term = rfMul(ring, { num: polyScale(a.num, q(BigInt(-e))), den }, df);
    out = rfAdd(ring, out, term);
  }
  return out;
}
