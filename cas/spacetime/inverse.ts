import { type RatFun, rfDiv, rfIsZero, rfMul, rfOne, rfSub, rfZero } from "../simplify/algebra/ratfun";
import type { Ring } from "../simplify/algebra/ring";

/** Raised when a metric has no inverse (its determinant is identically zero). */
export class DegenerateMetricError extends Error {
  constructor() {
    super("the metric is degenerate: its determinant is zero");
    this.name = "DegenerateMetricError";
  }
}

/**
 * The inverse of a symmetric matrix of rational functions by Gauss–Jordan
 * elimination, choosing the smallest non-zero pivot; zeros are skipped so a
 * diagonal or block-diagonal metric costs almost nothing.
 *
 * @example
 * inverseMatrix(ring, g)[0][0] // g^{tt}
 */
export function inverseMatrix(ring: Ring, matrix: readonly (readonly RatFun[])[]): RatFun[][] {
  const n = matrix.length;
  const a = matrix.map((row) => [...row]);
  const inv = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? rfOne() : rfZero())));
  for (let col = 0; col < n; col += 1) {
    let pivot = -1;
    for (let row = col; row < n; row += 1) {
      if (rfIsZero(a[row][col])) continue;
      if (pivot < 0 || a[row][col].num.size < a[pivot][col].num.size) pivot = row;
    }
    if (pivot < 0) throw new DegenerateMetricError();
    [a[col], a[pivot]] = [a[pivot], a[col]];
    [inv[col], inv[pivot]] = [inv[pivot], inv[col]];
    const p = a[col][col];
    for (let j = 0; j < n; j += 1) {
      if (!rfIsZero(a[col][j])) a[col][j] = rfDiv(ring, a[col][j], p);
      if (!rfIsZero(inv[col][j])) inv[col][j] = rfDiv(ring, inv[col][j], p);
    }
    for (let row = 0; row < n; row += 1) {
      if (row === col || rfIsZero(a[row][col])) continue;
      const factor = a[row][col];
      for (let j = 0; j < n; j += 1) {
        if (!rfIsZero(a[col][j])) a[row][j] = rfSub(ring, a[row][j], rfMul(ring, factor, a[col][j]));
        if (!rfIsZero(inv[col][j])) inv[row][j] = rfSub(ring, inv[row][j], rfMul(ring, factor, inv[col][j]));
      }
    }
  }
  return inv;
}
