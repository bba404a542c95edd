import { describe, expect, it } from "vitest";
import { runVerb } from "@/cas/api";
import { readPlain, readPlainExpr } from "@/cas/parse/plain";
import { probeEqual } from "@/cas/simplify/probe";
import { SCHWARZSCHILD_RS, SPHERICAL } from "./spacetime-fixtures";

type Symbolic = { latex: string; expr: string };

describe("geodesics verb", () => {
  const out = runVerb("geodesics", { coordinates: SPHERICAL, metric: SCHWARZSCHILD_RS, symbols: ["r_s"] });
  const value = (out as { value: {
    lagrangian: Symbolic; equations: (Symbolic & { coordinate: string; index: number })[];
    killing: { coordinate: string; components: number[] }[];
    conserved: { coordinate: string; name: string; perUnitMass: Symbolic; withMass: Symbolic }[];
  } }).value;

  it("answers the Lagrangian, the equations, the Killing vectors and the conserved quantities", () => {
    expect(out.ok).toBe(true);
    // Hartle (2003) eq. 9.9: the Lagrangian is g_ab ẋ^a ẋ^b
    expect(probeEqual(readPlainExpr(value.lagrangian.expr), readPlainExpr("-(1 - r_s/r)*c^2*dot(t)^2 + dot(r)^2/(1 - r_s/r) + r^2*dot(theta)^2 + r^2*sin(theta)^2*dot(phi)^2")).kind).toBe("equal");
    expect(value.equations.map((e) => e.coordinate)).toEqual(["t", "r", "\\theta", "\\phi"]);
    for (const e of value.equations) expect(readPlain(e.expr).kind).toBe("relation");
    // t and φ are cyclic: Killing vectors ∂_t, ∂_φ (Hartle (2003) §8.2, §9.2)
    expect(value.killing.map((k) => k.coordinate)).toEqual(["t", "\\phi"]);
    expect(value.killing[0].components).toEqual([1, 0, 0, 0]);
  });

  it("gives E = μ c^2 (1 - r_s/r) ṫ and L = μ r^2 sin^2θ φ̇", () => {
    // Hartle (2003) eqs. 9.21–9.22 (e = (1 - 2M/r) dt/dτ, ℓ = r^2 dφ/dτ, with c and μ restored)
    const energy = value.conserved.find((c) => c.name === "energy")!;
    const angular = value.conserved.find((c) => c.name === "angular momentum")!;
    expect(probeEqual(readPlainExpr(energy.withMass.expr), readPlainExpr("mu*c^2*(1 - r_s/r)*dot(t)")).kind).toBe("equal");
    expect(probeEqual(readPlainExpr(angular.perUnitMass.expr), readPlainExpr("r^2*sin(theta)^2*dot(phi)")).kind).toBe("equal");
  });

  it("the r equation is the radial geodesic equation", () => {
    // r̈ + Γ^r_ab ẋ^a ẋ^b = 0 with Γ^r_tt = c^2 r_s (r - r_s)/(2 r^3), Γ^r_rr = -r_s/(2 r (r - r_s)),
    // Γ^r_θθ = -(r - r_s), Γ^r_φφ = -(r - r_s) sin^2θ (Carroll (2004) eq. 5.53 with c restored)
    const r = value.equations.find((e) => e.coordinate === "r")!;
    const lhs = readPlain(r.expr);
    if (lhs.kind !== "relation") throw new Error("expected a relation");
    const expected = readPlainExpr("ddot(r) + c^2*r_s*(r - r_s)/(2*r^3)*dot(t)^2 - r_s/(2*r*(r - r_s))*dot(r)^2 - (r - r_s)*dot(theta)^2 - (r - r_s)*sin(theta)^2*dot(phi)^2");
    expect(probeEqual(lhs.lhs, expected).kind).toBe("equal");
  });
});
