import { describe, expect, it } from "vitest";
import { orbitTrajectory } from "@/cas/spacetime/orbit-trajectory";
import { perihelionAdvance } from "@/cas/spacetime/orbit-integration";

// Schwarzschild in geometric units with r_s = 2m: A = 1 − 2m/r.
const schwarzschild = (m: number) => ({ A: (r: number) => 1 - (2 * m) / r, dA: (r: number) => (2 * m) / (r * r) });

describe("orbitTrajectory", () => {
  it("traces a Kepler ellipse in a weak field: r = a(1 − e) at φ = 0 and a(1 + e) at φ = π", () => {
    // Newtonian limit m/a → 0: the orbit is the closed ellipse r = a(1 − e²)/(1 + e cos φ) (Goldstein, Classical Mechanics, §3.7)
    const a = 1e6, e = 0.3;
    const { points, end } = orbitTrajectory(schwarzschild(1e-3), 1, a, e, { turns: 1, samplesPerTurn: 360 });
    expect(end).toBe("completed");
    expect(points).toHaveLength(361);
    for (const p of [points[0], points[90], points[180], points[270]]) {
      expect(p.r / ((a * (1 - e * e)) / (1 + e * Math.cos(p.phi)))).toBeCloseTo(1, 6);
    }
  });

  it("precesses by the same angle the perihelion-advance integration finds", () => {
    // internal consistency with cas/spacetime/orbit-integration.ts (no outside source)
    const f = schwarzschild(0.5), a = 40, e = 0.3;
    const advance = perihelionAdvance(f, 1, a, e);
    const { points } = orbitTrajectory(f, 1, a, e, { turns: 2, samplesPerTurn: 3600 });
    // after one turn the radius is still decreasing towards the advanced perihelion: the minimum of r near φ = 2π sits at 2π + advance
    const near = points.filter((p) => p.phi > 1.5 * Math.PI && p.phi < 2.5 * Math.PI);
    const perihelion = near.reduce((m, p) => (p.r < m.r ? p : m));
    expect(perihelion.phi - 2 * Math.PI).toBeCloseTo(advance, 2);
  });

  it("stops at the horizon for an orbit that plunges", () => {
    // a = 3.2 m with e = 0.5 reaches r_p = 1.6 m, inside r = 2m: no bound orbit is possible there
    expect(() => orbitTrajectory(schwarzschild(1), 1, 3.2, 0.5)).toThrow(RangeError);
  });
});
