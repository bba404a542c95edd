import { type RatFun, rfAdd, rfIsZero, rfMul, rfScale, rfSub, rfZero } from "../simplify/algebra/ratfun";
import { q } from "../simplify/algebra/rational-number";
import type { Geometry } from "./geometry";

/** gamma[a][b][c] = Γ^a_{bc}, symmetric in b, c. */
export type Christoffel = RatFun[][][];

const HALF = q(1n, 2n);

/**
 * Christoffel symbols of the second kind,
 * Γ^a_{bc} = ½ g^{ad} (∂_b g_{dc} + ∂_c g_{db} − ∂_d g_{bc}).
 *
 * @example
 * christoffel(geometryOf(schwarzschild))[1][0][0] // Γ^r_{tt}
 */
export function christoffel(geo: Geometry, tick: () => void = () => {}): Christoffel {
  const { n, dg, ginv, ring } = geo;
  // lowered[d][b][c] = Γ_{dbc}
  const lowered: RatFun[][][] = Array.from({ length: n }, () => Array.from({ length: n }, () => new Array<RatFun>(n)));
  for (let d = 0; d < n; d += 1) {
    for (let b = 0; b < n; b += 1) {
      for (let c = b; c < n; c += 1) {
        const sum = rfSub(ring, rfAdd(ring, dg[b][d][c], dg[c][d][b]), dg[d][b][c]);
        lowered[d][b][c] = lowered[d][c][b] = rfScale(sum, HALF);
      }
    }
  }
  const gamma: Christoffel = Array.from({ length: n }, () => Array.from({ length: n }, () => new Array<RatFun>(n)));
  for (let a = 0; a < n; a += 1) {
    for (let b = 0; b < n; b += 1) {
      for (let c = b; c < n; c += 1) {
        let sum = rfZero();
        for (let d = 0; d < n; d += 1) {
          if (rfIsZero(ginv[a][d]) || rfIsZero(lowered[d][b][c])) continue;
          sum = rfAdd(ring, sum, rfMul(ring, ginv[a][d], lowered[d][b][c]));
        }
        gamma[a][b][c] = gamma[a][c][b] = sum;
      }
      tick();
    }
  }
  return gamma;
}
