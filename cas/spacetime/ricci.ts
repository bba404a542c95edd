import { type RatFun, rfAdd, rfIsZero, rfMul, rfScale, rfSub, rfZero } from "../simplify/algebra/ratfun";
import { q } from "../simplify/algebra/rational-number";
import type { Geometry } from "./geometry";
import type { Riemann } from "./riemann";

/**
 * The Ricci tensor R_{bd} = R^a_{bad} (MTW), symmetric.
 *
 * @example
 * ricci(geo, riemann(geo, gamma))[0][0] // R_tt, 0 for Schwarzschild
 */
export function ricci(geo: Geometry, riem: Riemann): RatFun[][] {
  const { n, ring } = geo;
  const out: RatFun[][] = Array.from({ length: n }, () => new Array<RatFun>(n));
  for (let b = 0; b < n; b += 1) {
    for (let d = b; d < n; d += 1) {
      let sum = rfZero();
      for (let a = 0; a < n; a += 1) if (!rfIsZero(riem[a][b][a][d])) sum = rfAdd(ring, sum, riem[a][b][a][d]);
      out[b][d] = out[d][b] = sum;
    }
  }
  return out;
}

/** The Ricci scalar R = g^{bd} R_{bd}. */
export function ricciScalar(geo: Geometry, ric: RatFun[][]): RatFun {
  const { n, ring, ginv } = geo;
  let sum = rfZero();
  for (let b = 0; b < n; b += 1) {
    for (let d = 0; d < n; d += 1) {
      if (rfIsZero(ginv[b][d]) || rfIsZero(ric[b][d])) continue;
      sum = rfAdd(ring, sum, rfMul(ring, ginv[b][d], ric[b][d]));
    }
  }
  return sum;
}

/** The Einstein tensor G_{ab} = R_{ab} − ½ R g_{ab}. */
export function einstein(geo: Geometry, ric: RatFun[][], scalar: RatFun): RatFun[][] {
  const { n, ring, g } = geo;
  const half = rfScale(scalar, q(1n, 2n));
  return Array.from({ length: n }, (_, a) => Array.from({ length: n }, (_, b) => (rfIsZero(g[a][b]) ? ric[a][b] : rfSub(ring, ric[a][b], rfMul(ring, half, g[a][b])))));
}
