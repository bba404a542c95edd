import { describe, expect, it } from "vitest";
import { readPlainExpr } from "@/cas/parse/plain";
import { toPlain } from "@/cas/print/plain";
import { probeEqual } from "@/cas/simplify/probe";
import { geodesics } from "@/cas/spacetime/geodesics";
import * as M from "./metrics";

describe("geodesics", () => {
  it("Kerr has the Killing vectors ∂_t and ∂_φ and conserved E, L with the frame-dragging cross term", () => {
    const g = geodesics(M.metricOf(M.KERR));
    expect(g.killing.map((k) => k.coordinate)).toEqual(["t", "phi"]); // MTW (1973) §33.4: stationary and axisymmetric
    const energy = g.conserved.find((c) => c.name === "energy")!;
    // E/μ = −g_tt ṫ − g_tφ φ̇ (MTW (1973) eq. 33.27 with c restored)
    const expected = readPlainExpr(`(1 - r_s*r/(r^2 + a^2*cos(theta)^2))*c^2*dot(t) + r_s*r*a*sin(theta)^2*c/(r^2 + a^2*cos(theta)^2)*dot(phi)`);
    expect(probeEqual(energy.perUnitMass, expected).kind).toBe("equal");
  });

  it("FLRW has momenta along x, y, z and no conserved energy", () => {
    const g = geodesics(M.metricOf(M.FLRW_FLAT));
    expect(g.killing.map((k) => k.coordinate)).toEqual(["x", "y", "z"]); // homogeneous, not static (Carroll (2004) §8.1)
    expect(g.conserved.every((c) => c.name === "momentum")).toBe(true);
    // p_x/μ = a(t)^2 ẋ
    expect(probeEqual(g.conserved[0].perUnitMass, readPlainExpr("a(t)^2*dot(x)", { functions: ["a"] })).kind).toBe("equal");
  });

  it("states the normalisation for timelike and null geodesics", () => {
    const g = geodesics(M.metricOf(M.SCHWARZSCHILD));
    expect(toPlain(g.normalisation.timelike)).toBe("-c^2");
    expect(toPlain(g.normalisation.null)).toBe("0");
    const geometric = geodesics(M.metricOf(M.VAIDYA));
    expect(toPlain(geometric.normalisation.timelike)).toBe("-1");
  });

  it("the θ equation of flat space is θ̈ − sinθ cosθ φ̇² + 2ṙθ̇/r = 0", () => {
    // spherical coordinates, a fact of the trade (e.g. Hartle (2003) §8.1)
    const g = geodesics(M.metricOf(M.FLAT_SPHERICAL));
    const theta = g.equations.find((e) => e.coordinate === "theta")!;
    expect(probeEqual(theta.expr, readPlainExpr("ddot(theta) - sin(theta)*cos(theta)*dot(phi)^2 + 2*dot(r)*dot(theta)/r")).kind).toBe("equal");
  });
});
