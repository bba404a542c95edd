import { describe, expect, it } from "vitest";
import { lightDeflection, perihelionAdvance } from "@/cas/spacetime/orbit-integration";

// Schwarzschild with GM/c² = m: A = 1 − 2m/r
const schwarzschild = (m: number) => ({ A: (r: number) => 1 - (2 * m) / r, dA: (r: number) => (2 * m) / (r * r) });

describe("orbit integration (odex)", () => {
  it("a weak-field orbit advances by 6πm/(a(1−e²)) per orbit", () => {
    // Will, Living Rev. Relativ. 17, 4 (2014), eq. for the perihelion shift; geometric units c = 1
    const a = 1e5, e = 0.3;
    const exact = perihelionAdvance(schwarzschild(1), 1, a, e);
    const firstOrder = (6 * Math.PI) / (a * (1 - e * e));
    expect(Math.abs(exact - firstOrder) / firstOrder).toBeLessThan(1e-3);
  });

  it("a strong-field orbit advances more than the first-order formula says", () => {
    // second-order terms are positive (e.g. Damour & Schäfer, Nuovo Cimento B 101, 127 (1988)); from memory
    const exact = perihelionAdvance(schwarzschild(1), 1, 20, 0.2);
    expect(exact).toBeGreaterThan((6 * Math.PI) / (20 * (1 - 0.04)));
  });

  it("light deflection tends to 4m/b for large b", () => {
    // Will (2014): α = 4GM/(c²b) to first order
    const b = 1e6;
    expect(Math.abs(lightDeflection(schwarzschild(1), b) - 4 / b) / (4 / b)).toBeLessThan(1e-4);
  });
});
