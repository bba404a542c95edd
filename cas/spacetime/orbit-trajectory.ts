import { Solver } from "./odex-runtime";
import type { RadialFunctions } from "./orbit-integration";

/** A sampled orbit in the plane of motion (x = r cos φ, y = r sin φ), in the units of r. */
export interface OrbitTrajectory {
  readonly points: readonly { readonly x: number; readonly y: number; readonly phi: number; readonly r: number }[];
  /** ℓ² (angular momentum per unit rest mass, squared) of the bound orbit through r_p = a(1 − e) and r_a = a(1 + e). */
  readonly ell2: number;
  /** "plunged" when the orbit crossed A(r) = 0 (a horizon) before the requested number of turns. */
  readonly end: "completed" | "plunged";
}

/**
 * Integrates the exact orbit equation of a static, spherically symmetric metric
 * with A·B = 1 (the one {@link perihelionAdvance} uses,
 * u'' = c² r² A'(r)/(2ℓ²) − u A(r) + ½ A'(r), u = 1/r) from perihelion over
 * `turns` revolutions of φ, and samples it on an even grid in φ for plotting.
 * odex's dense output gives the samples, so the grid does not limit the accuracy.
 *
 * @example
 * orbitTrajectory({ A: (r) => 1 - 1 / r, dA: (r) => 1 / r ** 2 }, 1, 50, 0.2, { turns: 3 }).points.length // 3·240 + 1
 */
export function orbitTrajectory(
  f: RadialFunctions,
  c: number,
  a: number,
  e: number,
  options: { turns?: number; samplesPerTurn?: number } = {},
): OrbitTrajectory {
  if (!(a > 0) || !(e >= 0 && e < 1)) throw new RangeError("a bound orbit needs a > 0 and 0 ≤ e < 1");
  const turns = options.turns ?? 3;
  const perTurn = options.samplesPerTurn ?? 240;
  const rp = a * (1 - e);
  const ra = a * (1 + e);
  const up = 1 / rp;
  const ua = 1 / ra;
  // ℓ² from the two turning points of the energy equation (as in perihelionAdvance); at e = 0, the circular-orbit ℓ²
  const ell2 = e === 0
    ? (c * c * rp * rp * rp * f.dA(rp)) / (2 * f.A(rp) - rp * f.dA(rp))
    : (c * c * (f.A(ra) - f.A(rp))) / (up * up * f.A(rp) - ua * ua * f.A(ra));
  if (!(ell2 > 0) || !Number.isFinite(ell2)) throw new RangeError("no bound orbit with this semi-major axis and eccentricity");
  // scaled variable w = u·a keeps the numbers near 1
  const rhs = (_phi: number, y: number[]) => {
    const u = y[0] / a;
    const r = 1 / u;
    const dA = f.dA(r);
    return [y[1], ((c * c * r * r * dA) / (2 * ell2) - u * f.A(r) + 0.5 * dA) * a];
  };
  const solver = new Solver(2);
  solver.denseOutput = true;
  solver.absoluteTolerance = 1e-12;
  solver.relativeTolerance = 1e-12;
  solver.maxSteps = 200_000;
  const dphi = (2 * Math.PI) / perTurn;
  const total = turns * perTurn;
  const points: { x: number; y: number; phi: number; r: number }[] = [{ x: rp, y: 0, phi: 0, r: rp }];
  let next = 1;
  let end: OrbitTrajectory["end"] = "completed";
  const phiEnd = total * dphi;
  try {
    solver.solve(rhs, 0, [a * up, 0], phiEnd, (_n, xOld, x, _y, dense) => {
    if (!dense) return undefined;
    while (next <= total && next * dphi <= x + 1e-12) {
      const phi = next * dphi;
      const w = phi <= xOld ? _y[0] : dense(0, phi);
      const r = a / w;
      if (!(r > 0) || !(f.A(r) > 0)) {
        end = "plunged";
        return false;
      }
      points.push({ x: r * Math.cos(phi), y: r * Math.sin(phi), phi, r });
      next += 1;
    }
    return undefined;
    });
  } catch {
    // the step size collapses as r → 0 behind a horizon: the orbit has plunged
    end = "plunged";
  }
  if (next <= total && end === "completed") end = "plunged";
  return { points, ell2, end };
}
