import { Solver } from "./odex-runtime";

/**
 * Orbit equations for a static, spherically symmetric metric with A·B = 1,
 * integrated with odex (Gragg–Bulirsch–Stoer). With u = 1/r and φ the angle,
 * the energy equation ½ℓ²u'² + ½c²(A − 1) + ½ℓ²u²A = const gives
 *   u'' = c² r² A'(r)/(2ℓ²) − u A(r) + ½ A'(r)        (timelike, ℓ = L/μ)
 *   u'' = −u A(r) + ½ A'(r)                            (null)
 * which for A = 1 − 2GM/(c²r) is u'' + u = GM/ℓ² + 3GMu²/c².
 * Both are integrated in the scaled variable w = u·scale so the numbers stay near 1.
 */
export interface RadialFunctions {
  readonly A: (r: number) => number;
  readonly dA: (r: number) => number;
}

function integrateUntil(
  rhs: (phi: number, y: number[]) => number[],
  y0: number[],
  phiMax: number,
  stop: (y: number[], phi: number) => boolean,
  component: number,
): number {
  const solver = new Solver(2);
  solver.denseOutput = true;
  solver.absoluteTolerance = 1e-14;
  solver.relativeTolerance = 1e-14;
  solver.maxSteps = 100_000;
  let found = Number.NaN;
  let previous = y0[component];
  solver.solve(rhs, 0, y0, phiMax, (_n, xOld, x, y, dense) => {
    const now = y[component];
    if (x > 0.5 && stop(y, x) && previous > 0 && now <= 0 && dense) {
      // the crossing of y[component] through zero, by bisection on the dense interpolant
      let lo = xOld;
      let hi = x;
      for (let i = 0; i < 200 && hi - lo > 1e-16 * Math.max(1, hi); i += 1) {
        const mid = (lo + hi) / 2;
        if (dense(component, mid) > 0) lo = mid; else hi = mid;
      }
      found = (lo + hi) / 2;
      return false;
    }
    previous = now;
    return undefined;
  });
  if (!Number.isFinite(found)) throw new Error("the orbit did not close within the integration range");
  return found;
}

/**
 * Perihelion advance per orbit (radians) for a bound orbit with the given
 * semi-major axis and eccentricity (r_p = a(1 − e), r_a = a(1 + e)), by
 * integrating the exact orbit equation from one perihelion to the next.
 *
 * @example
 * perihelionAdvance(schwarzschildA(m), c, a, e) // ≈ 6π m/(a(1 − e²))
 */
export function perihelionAdvance(f: RadialFunctions, c: number, a: number, e: number): number {
  const rp = a * (1 - e);
  const ra = a * (1 + e);
  const up = 1 / rp;
  const ua = 1 / ra;
  // ℓ² from the two turning points of the energy equation
  const ell2 = (c * c * (f.A(ra) - f.A(rp))) / (up * up * f.A(rp) - ua * ua * f.A(ra));
  if (!(ell2 > 0)) throw new Error("no bound orbit with this semi-major axis and eccentricity");
  const rhs = (_phi: number, y: number[]) => {
    const u = y[0] / a;
    const r = 1 / u;
    const dA = f.dA(r);
    const upp = (c * c * r * r * dA) / (2 * ell2) - u * f.A(r) + 0.5 * dA;
    return [y[1], upp * a];
  };
  // start at perihelion (w' = 0, w at its maximum); the next perihelion is where w' goes from + to − again
  const next = integrateUntil(rhs, [a * up, 0], 4 * Math.PI, (_y, phi) => phi > Math.PI, 1);
  return next - 2 * Math.PI;
}

/**
 * Deflection angle (radians) of a light ray with impact parameter b: from the
 * closest approach r0 (b² = r0²/A(r0)) out to infinity, doubled, minus π.
 *
 * @example
 * lightDeflection(schwarzschildA(m), b) // ≈ 4m/b
 */
export function lightDeflection(f: RadialFunctions, b: number): number {
  // closest approach: r0²/A(r0) = b², the largest root, by bisection between the photon region and b·2
  const g = (r: number) => (r * r) / f.A(r) - b * b;
  let lo = b * 1e-6;
  let hi = b * 2;
  for (let r = hi; r > lo; r *= 0.999) { if (g(r) < 0 && f.A(r) > 0) { lo = r; break; } }
  for (let i = 0; i < 300; i += 1) {
    const mid = (lo + hi) / 2;
    if (g(mid) < 0) lo = mid; else hi = mid;
  }
  const r0 = (lo + hi) / 2;
  const rhs = (_phi: number, y: number[]) => {
    const u = y[0] / b;
    const r = 1 / u;
    if (!Number.isFinite(r)) return [y[1], 0]; // at infinity the ray is straight
    const dA = f.dA(r);
    return [y[1], (-u * f.A(r) + 0.5 * dA) * b];
  };
  const quarter = integrateUntil(rhs, [b / r0, 0], 2 * Math.PI, () => true, 0);
  return 2 * quarter - Math.PI;
}
