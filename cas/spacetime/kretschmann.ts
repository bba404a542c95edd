import { type RatFun, rfAdd, rfIsZero, rfMul, rfScale, rfZero } from "../simplify/algebra/ratfun";
import { q } from "../simplify/algebra/rational-number";
import type { Geometry } from "./geometry";
import type { Riemann } from "./riemann";

/**
 * The Kretschmann scalar K = R_{abcd} R^{abcd}. Lowers the first index, raises
 * all four one at a time over the non-zero entries of g^{ab}, and sums over
 * a < b, c < d with the factor 4 the antisymmetries give.
 *
 * @example
 * kretschmann(geo, riem) // 12 r_s^2 / r^6 for Schwarzschild
 */
export function kretschmann(geo: Geometry, riem: Riemann, tick: () => void = () => {}): RatFun {
  const { n, ring, g, ginv } = geo;
  const pairs: [number, number][] = [];
  for (let a = 0; a < n; a += 1) for (let b = a + 1; b < n; b += 1) pairs.push([a, b]);
  // down[a][b][c][d] = g_ae R^e_bcd, only c < d stored (others derived on read)
  const zero = rfZero();
  const grid = () => Array.from({ length: n }, () => Array.from({ length: n }, () => Array.from({ length: n }, () => new Array<RatFun>(n).fill(zero))));
  const down = grid();
  for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) for (const [c, d] of pairs) {
    let sum = rfZero();
    for (let e = 0; e < n; e += 1) if (!rfIsZero(g[a][e]) && !rfIsZero(riem[e][b][c][d])) sum = rfAdd(ring, sum, rfMul(ring, g[a][e], riem[e][b][c][d]));
    down[a][b][c][d] = sum;
    down[a][b][d][c] = rfScale(sum, q(-1n));
  }
  tick();
  // Raise a and b one at a time; raise c and d together, which keeps the c, d antisymmetry the storage relies on.
  let t = down;
  for (let slot = 0; slot < 2; slot += 1) {
    const next = grid();
    for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) for (let c = 0; c < n; c += 1) for (let d = c + 1; d < n; d += 1) {
      const idx = [a, b, c, d];
      let sum = rfZero();
      for (let y = 0; y < n; y += 1) {
        const gy = ginv[idx[slot]][y];
        if (rfIsZero(gy)) continue;
        const j = [...idx];
        j[slot] = y;
        const v = t[j[0]][j[1]][j[2]][j[3]];
        if (!rfIsZero(v)) sum = rfAdd(ring, sum, rfMul(ring, gy, v));
      }
      next[a][b][c][d] = sum;
      next[a][b][d][c] = rfScale(sum, q(-1n));
    }
    t = next;
    tick();
  }
  const up = grid();
  for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) for (let c = 0; c < n; c += 1) for (let d = c + 1; d < n; d += 1) {
    let sum = rfZero();
    for (let y = 0; y < n; y += 1) {
      if (rfIsZero(ginv[c][y])) continue;
      for (let z = 0; z < n; z += 1) {
        if (y === z || rfIsZero(ginv[d][z]) || rfIsZero(t[a][b][y][z])) continue;
        sum = rfAdd(ring, sum, rfMul(ring, rfMul(ring, ginv[c][y], ginv[d][z]), t[a][b][y][z]));
      }
    }
    up[a][b][c][d] = sum;
    up[a][b][d][c] = rfScale(sum, q(-1n));
  }
  t = up;
  tick();
  let k = rfZero();
  for (const [a, b] of pairs) for (const [c, d] of pairs) {
    if (rfIsZero(down[a][b][c][d]) || rfIsZero(t[a][b][c][d])) continue;
    k = rfAdd(ring, k, rfMul(ring, down[a][b][c][d], t[a][b][c][d]));
  }
  return rfScale(k, q(4n));
}
