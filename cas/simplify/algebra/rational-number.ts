/**
 * Exact rational numbers on BigInt, always in lowest terms with a positive
 * denominator, so equal values have equal fields.
 *
 * @example
 * qAdd(q(1n, 2n), q(1n, 3n)) // { n: 5n, d: 6n }
 */
export interface Q { readonly n: bigint; readonly d: bigint }

export function bigGcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) { const t = a % b; a = b; b = t; }
  return a;
}

/** Builds n/d in lowest terms. */
export function q(n: bigint, d: bigint = 1n): Q {
  if (d === 0n) throw new RangeError("zero denominator");
  if (d === 1n) return { n, d };
  if (d < 0n) { n = -n; d = -d; }
  const g = bigGcd(n, d);
  return g === 1n ? { n, d } : { n: n / g, d: d / g };
}

export const Q_ZERO: Q = { n: 0n, d: 1n };
export const Q_ONE: Q = { n: 1n, d: 1n };

export const qIsZero = (a: Q) => a.n === 0n;
export const qIsOne = (a: Q) => a.n === 1n && a.d === 1n;
export const qEquals = (a: Q, b: Q) => a.n === b.n && a.d === b.d;
export const qNeg = (a: Q): Q => ({ n: -a.n, d: a.d });

export function qAdd(a: Q, b: Q): Q {
  if (a.d === 1n && b.d === 1n) return { n: a.n + b.n, d: 1n };
  if (a.d === b.d) return q(a.n + b.n, a.d);
  return q(a.n * b.d + b.n * a.d, a.d * b.d);
}
export function qSub(a: Q, b: Q): Q { return qAdd(a, qNeg(b)); }
export function qMul(a: Q, b: Q): Q {
  if (a.d === 1n && b.d === 1n) return { n: a.n * b.n, d: 1n };
  return q(a.n * b.n, a.d * b.d);
}
export function qInv(a: Q): Q {
  if (a.n === 0n) throw new RangeError("division by zero");
  return q(a.d, a.n);
}
export function qDiv(a: Q, b: Q): Q { return qMul(a, qInv(b)); }

/** Reads a decimal literal exactly: "0.5" → 1/2, "6.674e-11" → 6674/10^14. */
export function qFromDecimal(text: string): Q {
  const m = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text.trim());
  if (!m || (m[2] === "" && (m[3] ?? "") === "")) throw new RangeError(`not a decimal number: ${text}`);
  const digits = (m[2] || "0") + (m[3] ?? "");
  let exp = Number(m[4] ?? "0") - (m[3] ?? "").length;
  let n = BigInt(digits);
  if (m[1] === "-") n = -n;
  if (exp >= 0) return q(n * 10n ** BigInt(exp), 1n);
  exp = -exp;
  return q(n, 10n ** BigInt(exp));
}

/** A float approximation (for plots and orbit numbers only). */
export function qToNumber(a: Q): number {
  return Number(a.n) / Number(a.d);
}
