import type Decimal from "decimal.js";
import type { DecimalContext } from "./evaluate";

/**
 * Double-double arithmetic: a value is the unevaluated sum hi + lo of two
 * float64 with |lo| ≤ ½ ulp(hi), about 106 bits (31 decimal digits) of
 * precision in the float64 exponent range. The basic operations are the
 * error-free transformations of Dekker (1971) and Knuth (TAOCP vol. 2 §4.2.2)
 * as arranged in Hida, Li & Bailey's QD library (2001); each is accurate to a
 * few units in the last place (~1e-31 relative), many times faster than
 * decimal.js at 25 digits. For numeric verification where a tolerance far
 * above that rounding is applied (see cas/check/README.md, "The curvature sheet's numeric check").
 */
export class DD {
  constructor(readonly hi: number, readonly lo: number) {}
}

/** Significant decimal digits a double-double carries: ⌊106 · log10 2⌋. */
export const DD_DIGITS = 31;

const DD_ZERO = new DD(0, 0);
export const DD_ONE = new DD(1, 0);

export const ddOf = (x: number): DD => new DD(x, 0);

// Veltkamp's splitter 2^27 + 1: splits a double into two 26-bit halves.
const SPLITTER = 134217729;

function twoProdHiLo(a: number, b: number): DD {
  const p = a * b;
  let t = SPLITTER * a;
  const ah = t - (t - a);
  const al = a - ah;
  t = SPLITTER * b;
  const bh = t - (t - b);
  const bl = b - bh;
  return new DD(p, ((ah * bh - p) + ah * bl + al * bh) + al * bl);
}

export function ddAdd(a: DD, b: DD): DD {
  // IEEE-style (accurate) sum: both parts added with error-free two-sums.
  let s = a.hi + b.hi;
  let bb = s - a.hi;
  let e = (a.hi - (s - bb)) + (b.hi - bb);
  const t = a.lo + b.lo;
  bb = t - a.lo;
  const f = (a.lo - (t - bb)) + (b.lo - bb);
  e += t;
  let hi = s + e;
  e -= hi - s;
  s = hi;
  e += f;
  hi = s + e;
  return new DD(hi, e - (hi - s));
}

export const ddNeg = (a: DD): DD => new DD(-a.hi, -a.lo);

export const ddSub = (a: DD, b: DD): DD => ddAdd(a, ddNeg(b));

export function ddMul(a: DD, b: DD): DD {
  const p = twoProdHiLo(a.hi, b.hi);
  const e = p.lo + (a.hi * b.lo + a.lo * b.hi);
  const hi = p.hi + e;
  return new DD(hi, e - (hi - p.hi));
}

/** a / b by long division with three quotient digits (QD's accurate division). NaN/∞ when b is 0: callers check. */
export function ddDiv(a: DD, b: DD): DD {
  const q1 = a.hi / b.hi;
  let r = ddSub(a, ddMul(ddOf(q1), b));
  const q2 = r.hi / b.hi;
  r = ddSub(r, ddMul(ddOf(q2), b));
  const q3 = r.hi / b.hi;
  const hi = q1 + q2;
  return ddAdd(new DD(hi, q2 - (hi - q1)), ddOf(q3));
}

/** √a by one Newton step on the float64 root (Karp & Markstein). NaN for a < 0. */
export function ddSqrt(a: DD): DD {
  if (a.hi === 0 && a.lo === 0) return DD_ZERO;
  if (a.hi < 0) return new DD(NaN, NaN);
  const x = 1 / Math.sqrt(a.hi);
  const ax = ddOf(a.hi * x);
  return ddAdd(ax, ddOf(ddSub(a, ddMul(ax, ax)).hi * (x * 0.5)));
}

/** a^k for an integer k, by repeated squaring (error grows with log2 |k| ulps). */
export function ddPowInt(a: DD, k: number): DD {
  if (k === 0) return DD_ONE;
  let n = Math.abs(k);
  let base = a;
  let out = DD_ONE;
  while (n > 0) {
    if (n & 1) out = ddMul(out, base);
    n = Math.floor(n / 2);
    if (n > 0) base = ddMul(base, base);
  }
  return k < 0 ? ddDiv(DD_ONE, out) : out;
}

// π/2 to double-double precision, and 1/k! for the Taylor series of sin and cos on [−π/4, π/4].
const HALF_PI = new DD(1.5707963267948966, 6.123233995736766e-17);
const INVERSE_FACTORIALS: DD[] = (() => {
  const out = [DD_ONE];
  for (let k = 1; k <= 30; k += 1) out.push(ddDiv(out[k - 1], ddOf(k)));
  return out;
})();
const TRIG_LIMIT = 1e6;

/** (−1)^j / m! */
const alternating = (j: number, m: number): DD => (j % 2 === 0 ? INVERSE_FACTORIALS[m] : ddNeg(INVERSE_FACTORIALS[m]));

/**
 * sin x and cos x for |x| ≤ 10^6 (null beyond: the caller uses decimal.js).
 * x is reduced by the nearest multiple k·π/2 to t in [−π/4, π/4], where
 * sin t = t Σ (−1)^j t^{2j}/(2j+1)! and cos t = Σ (−1)^j t^{2j}/(2j)! reach
 * 1e-33 by t^29 and t^30 (Horner in t²); k mod 4 picks the quadrant.
 */
export function ddSinCos(x: DD): { sin: DD; cos: DD } | null {
  if (!(Math.abs(x.hi) <= TRIG_LIMIT)) return null;
  const k = Math.round(x.hi / HALF_PI.hi);
  const t = ddSub(x, ddMul(ddOf(k), HALF_PI));
  const u = ddMul(t, t);
  let s = alternating(14, 29);
  for (let j = 13; j >= 0; j -= 1) s = ddAdd(alternating(j, 2 * j + 1), ddMul(u, s));
  s = ddMul(t, s);
  let c = alternating(15, 30);
  for (let j = 14; j >= 0; j -= 1) c = ddAdd(alternating(j, 2 * j), ddMul(u, c));
  switch (((k % 4) + 4) % 4) {
    case 0: return { sin: s, cos: c };
    case 1: return { sin: c, cos: ddNeg(s) };
    case 2: return { sin: ddNeg(s), cos: ddNeg(c) };
    default: return { sin: ddNeg(c), cos: s };
  }
}


/** The double-double nearest a decimal.js value (to ~1e-32 relative; ±∞ beyond the float64 range). */
export function ddFromDecimal(D: DecimalContext, x: Decimal): DD {
  const hi = x.toNumber();
  if (!Number.isFinite(hi) || hi === 0) return ddOf(hi);
  // toPrecision(40) writes hi's exact binary value to 40 digits, so x − hi is the true remainder.
  return new DD(hi, x.minus(new D(hi.toPrecision(40))).toNumber());
}

/** The decimal.js value of a double-double, exact to the precision of D. */
export function ddToDecimal(D: DecimalContext, a: DD): Decimal {
  return new D(a.hi.toPrecision(40)).plus(new D(a.lo.toPrecision(40)));
}
