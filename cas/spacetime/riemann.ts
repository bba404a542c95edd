import { type RatFun, rfAdd, rfIsZero, rfMul, rfNeg, rfSub, rfZero } from "../simplify/algebra/ratfun";
import { rfDerivativeBy } from "../simplify/algebra/calculus";
import type { Geometry } from "./geometry";
import type { Christoffel } from "./christoffel";

/** riemann[a][b][c][d] = R^a_{bcd}, antisymmetric in c, d (both halves filled). */
export type Riemann = RatFun[][][][];

/**
 * The Riemann tensor in the MTW convention,
 * R^a_{bcd} = ∂_c Γ^a_{db} − ∂_d Γ^a_{cb} + Γ^a_{ce} Γ^e_{db} − Γ^a_{de} Γ^e_{cb}.
 * Only c < d is computed; the rest follows by antisymmetry.
 *
 * @example
 * riemann(geo, christoffel(geo))[1][0][1][0] // R^r_{trt}
 */
export function riemann(geo: Geometry, gamma: Christoffel, tick: () => void = () => {}): Riemann {
  const { n, ring, coordinates } = geo;
  const dGamma = new Map<string, RatFun>();
  const dG = (c: number, a: number, b: number, d: number): RatFun => {
    const key = `${c}${a}${b < d ? `${b}${d}` : `${d}${b}`}`;
    let v = dGamma.get(key);
    if (v === undefined) {
      v = rfIsZero(gamma[a][b][d]) ? rfZero() : rfDerivativeBy(ring, gamma[a][b][d], coordinates[c]);
      dGamma.set(key, v);
    }
    return v;
  };
  const out: Riemann = Array.from({ length: n }, () => Array.from({ length: n }, () => Array.from({ length: n }, () => new Array<RatFun>(n).fill(rfZero()))));
  for (let a = 0; a < n; a += 1) {
    for (let b = 0; b < n; b += 1) {
      for (let c = 0; c < n; c += 1) {
        for (let d = c + 1; d < n; d += 1) {
          let sum = rfSub(ring, dG(c, a, d, b), dG(d, a, c, b));
          for (let e = 0; e < n; e += 1) {
            if (!rfIsZero(gamma[a][c][e]) && !rfIsZero(gamma[e][d][b])) sum = rfAdd(ring, sum, rfMul(ring, gamma[a][c][e], gamma[e][d][b]));
            if (!rfIsZero(gamma[a][d][e]) && !rfIsZero(gamma[e][c][b])) sum = rfSub(ring, sum, rfMul(ring, gamma[a][d][e], gamma[e][c][b]));
          }
          out[a][b][c][d] = sum;
          out[a][b][d][c] = rfNeg(sum);
        }
      }
      tick();
    }
  }
  return out;
}
