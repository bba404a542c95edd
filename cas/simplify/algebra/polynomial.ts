import { Q, Q_ONE, q, qAdd, qDiv, qIsZero, qMul, qNeg, bigGcd } from "./rational-number";

/**
 * Sparse multivariate polynomials with exact rational coefficients.
 *
 * A monomial is keyed by a string whose i-th UTF-16 code unit is the exponent
 * of variable i (trailing zeros dropped, so the key does not depend on how many
 * variables exist). Plain string comparison is then lexicographic order on the
 * exponent vectors, which the exact division below relies on.
 *
 * @example
 * const x = polyVar(0), y = polyVar(1);
 * polyMul(polyAdd(x, y), polyAdd(x, y)) // x^2 + 2xy + y^2
 */
export type Poly = Map<string, Q>;

const trim = (codes: number[]): string => {
  let end = codes.length;
  while (end > 0 && codes[end - 1] === 0) end -= 1;
  return String.fromCharCode(...codes.slice(0, end));
};

export function monomialKey(exponents: readonly number[]): string {
  return trim([...exponents]);
}

export function exponentsOf(key: string): number[] {
  const out: number[] = [];
  for (let i = 0; i < key.length; i += 1) out.push(key.charCodeAt(i));
  return out;
}

export function exponentOf(key: string, v: number): number {
  return v < key.length ? key.charCodeAt(v) : 0;
}

export function keyMul(a: string, b: string): string {
  if (a.length === 0) return b;
  if (b.length === 0) return a;
  const n = Math.max(a.length, b.length);
  const codes = new Array<number>(n);
  for (let i = 0; i < n; i += 1) codes[i] = (i < a.length ? a.charCodeAt(i) : 0) + (i < b.length ? b.charCodeAt(i) : 0);
  return String.fromCharCode(...codes);
}

/** a / b for monomials, or null when b does not divide a. */
export function keyDiv(a: string, b: string): string | null {
  if (b.length > a.length) {
    for (let i = a.length; i < b.length; i += 1) if (b.charCodeAt(i) !== 0) return null;
  }
  const codes = new Array<number>(a.length);
  for (let i = 0; i < a.length; i += 1) {
    const e = a.charCodeAt(i) - (i < b.length ? b.charCodeAt(i) : 0);
    if (e < 0) return null;
    codes[i] = e;
  }
  return trim(codes);
}

export const polyZero = (): Poly => new Map();
export const polyConst = (c: Q): Poly => (qIsZero(c) ? new Map() : new Map([["", c]]));
export const polyOne = (): Poly => polyConst(Q_ONE);

export function polyVar(v: number, power = 1): Poly {
  const codes = new Array<number>(v + 1).fill(0);
  codes[v] = power;
  return new Map([[trim(codes), Q_ONE]]);
}

export const polyIsZero = (p: Poly) => p.size === 0;

/** The constant value of p, or null when p depends on a variable. */
export function polyConstant(p: Poly): Q | null {
  if (p.size === 0) return { n: 0n, d: 1n };
  if (p.size === 1 && p.has("")) return p.get("")!;
  return null;
}

/** Adds c·key into out in place. */
export function accumulate(out: Poly, key: string, c: Q): void {
  const prev = out.get(key);
  if (prev === undefined) { out.set(key, c); return; }
  const sum = qAdd(prev, c);
  if (qIsZero(sum)) out.delete(key);
  else out.set(key, sum);
}

export function polyAdd(a: Poly, b: Poly): Poly {
  const [big, small] = a.size >= b.size ? [a, b] : [b, a];
  const out = new Map(big);
  for (const [k, c] of small) accumulate(out, k, c);
  return out;
}

export function polyNeg(a: Poly): Poly {
  const out: Poly = new Map();
  for (const [k, c] of a) out.set(k, qNeg(c));
  return out;
}

export function polySub(a: Poly, b: Poly): Poly {
  const out = new Map(a);
  for (const [k, c] of b) accumulate(out, k, qNeg(c));
  return out;
}

export function polyScale(a: Poly, s: Q): Poly {
  if (qIsZero(s)) return new Map();
  const out: Poly = new Map();
  for (const [k, c] of a) out.set(k, qMul(c, s));
  return out;
}

export function polyMulMonomial(a: Poly, key: string, s: Q): Poly {
  const out: Poly = new Map();
  for (const [k, c] of a) out.set(keyMul(k, key), qMul(c, s));
  return out;
}

export function polyMul(a: Poly, b: Poly): Poly {
  if (a.size === 0 || b.size === 0) return new Map();
  const out: Poly = new Map();
  for (const [ka, ca] of a) for (const [kb, cb] of b) accumulate(out, keyMul(ka, kb), qMul(ca, cb));
  return out;
}

export function polyPow(a: Poly, n: number): Poly {
  let result = polyOne();
  let base = a;
  while (n > 0) {
    if (n & 1) result = polyMul(result, base);
    n >>= 1;
    if (n > 0) base = polyMul(base, base);
  }
  return result;
}

/** The lexicographically leading monomial key. */
export function leadingKey(p: Poly): string {
  let best: string | undefined;
  for (const k of p.keys()) if (best === undefined || k > best) best = k;
  if (best === undefined) throw new RangeError("the zero polynomial has no leading term");
  return best;
}

/**
 * Exact division a / b, or null when b does not divide a. Stops at the first
 * leading term b's leading term cannot divide, so a failed trial is cheap.
 */
export function polyDivExact(a: Poly, b: Poly): Poly | null {
  if (b.size === 0) throw new RangeError("division by the zero polynomial");
  const lk = leadingKey(b);
  const lc = b.get(lk)!;
  if (b.size === 1) {
    const out: Poly = new Map();
    for (const [k, c] of a) {
      const kk = keyDiv(k, lk);
      if (kk === null) return null;
      out.set(kk, qDiv(c, lc));
    }
    return out;
  }
  const rem = new Map(a);
  const quotient: Poly = new Map();
  while (rem.size > 0) {
    const rk = leadingKey(rem);
    const mk = keyDiv(rk, lk);
    if (mk === null) return null;
    const mc = qDiv(rem.get(rk)!, lc);
    quotient.set(mk, mc);
    for (const [k, c] of b) accumulate(rem, keyMul(k, mk), qNeg(qMul(c, mc)));
  }
  return quotient;
}

/** ∂p/∂x_v. */
export function polyDerivative(p: Poly, v: number): Poly {
  const out: Poly = new Map();
  for (const [k, c] of p) {
    const e = exponentOf(k, v);
    if (e === 0) continue;
    const codes = exponentsOf(k);
    codes[v] = e - 1;
    accumulate(out, trim(codes), qMul(c, q(BigInt(e))));
  }
  return out;
}

export function polyDependsOn(p: Poly, v: number): boolean {
  for (const k of p.keys()) if (exponentOf(k, v) > 0) return true;
  return false;
}

/** The rational content: gcd of the numerators over the lcm of the denominators, signed so the leading coefficient of p/content is positive. */
export function polyContent(p: Poly): Q {
  if (p.size === 0) return Q_ONE;
  let g = 0n;
  let l = 1n;
  for (const c of p.values()) {
    g = bigGcd(g, c.n);
    l = (l / bigGcd(l, c.d)) * c.d;
  }
  const lead = p.get(leadingKey(p))!;
  return q(lead.n < 0n ? -g : g, l);
}

/** The largest monomial dividing every term. */
export function polyMonomialContent(p: Poly): string {
  let min: number[] | undefined;
  for (const k of p.keys()) {
    const e = exponentsOf(k);
    if (min === undefined) { min = e; continue; }
    const n = Math.min(min.length, e.length);
    min.length = n;
    for (let i = 0; i < n; i += 1) min[i] = Math.min(min[i], e[i]);
  }
  return min === undefined ? "" : monomialKey(min);
}

/** A canonical text for a polynomial (used as a registry key). */
export function polyKey(p: Poly): string {
  return [...p.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([k, c]) => `${k}|${c.n}/${c.d}`).join(";");
}

export function totalDegree(key: string): number {
  let s = 0;
  for (let i = 0; i < key.length; i += 1) s += key.charCodeAt(i);
  return s;
}
