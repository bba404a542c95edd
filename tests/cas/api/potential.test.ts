import { describe, expect, it } from "vitest";
import { runVerb } from "@/cas/api";
import { readPlain, readPlainExpr } from "@/cas/parse/plain";
import { probeEqual } from "@/cas/simplify/probe";
import { SCHWARZSCHILD_GM, SCHWARZSCHILD_RS, SPHERICAL } from "./spacetime-fixtures";

type Symbolic = { latex: string; expr: string };
type Answer = {
  conserved: { energy: Symbolic; angularMomentum: Symbolic };
  radialEquation: Symbolic;
  effectivePotential: Symbolic;
  terms: (Symbolic & { name: string; limit: Symbolic | "infinity" | null })[];
  perUnitMass: { effectivePotential: Symbolic };
};
const same = (a: string, b: string) => probeEqual(readPlainExpr(a), readPlainExpr(b)).kind;

describe("potential verb", () => {
  const out = runVerb("potential", { coordinates: SPHERICAL, metric: SCHWARZSCHILD_GM, symbols: ["G", "M"] });
  const v = (out as { value: Answer }).value;

  it("gives V_eff = ½μc²(A − 1) + L²A/(2μr²) for Schwarzschild", () => {
    expect(out.ok).toBe(true);
    // the energy form for A·B = 1 (Hartle (2003) eq. 9.29, multiplied through by μc²)
    expect(same(v.effectivePotential.expr, "-G*M*mu/r + L^2/(2*mu*r^2) - G*M*L^2/(mu*c^2*r^3)")).toBe("equal");
    const radial = readPlain(v.radialEquation.expr);
    if (radial.kind !== "relation") throw new Error("expected a relation");
    expect(probeEqual(radial.rhs, readPlainExpr("(E^2 - mu^2*c^4)/(2*mu*c^2)")).kind).toBe("equal");
    expect(v.radialEquation.expr).toContain("1/2*mu*dot(r)^2");
    expect(same(v.conserved.energy.expr.split("=")[1], "mu*c^2*(1 - 2*G*M/(c^2*r))*dot(t)")).toBe("equal");
  });

  it("names the three terms and their limits as c → ∞", () => {
    // −GMμ/r, L²/(2μr²), −GML²/(μc²r³), the last vanishing as c → ∞ (a fact of the trade; Hartle (2003) §9.3)
    expect(v.terms.map((t) => t.name)).toEqual(["Newtonian attraction", "centrifugal", "relativistic correction"]);
    expect(same(v.terms[0].expr, "-G*M*mu/r")).toBe("equal");
    expect(same(v.terms[1].expr, "L^2/(2*mu*r^2)")).toBe("equal");
    expect(same(v.terms[2].expr, "-G*M*L^2/(mu*c^2*r^3)")).toBe("equal");
    expect((v.terms[2].limit as Symbolic).expr).toBe("0");
    expect(same((v.terms[0].limit as Symbolic).expr, "-G*M*mu/r")).toBe("equal");
  });

  it("substitutes definitions, and gives the per-unit-mass geometric form", () => {
    const withRs = runVerb("potential", { coordinates: SPHERICAL, metric: SCHWARZSCHILD_RS, symbols: ["r_s", "G", "M"], definitions: { r_s: "\\frac{2GM}{c^2}" } });
    const w = (withRs as { value: Answer }).value;
    expect(w.terms.map((t) => t.name)).toEqual(["Newtonian attraction", "centrifugal", "relativistic correction"]);
    // geometric units, per unit mass: Ṽ = −M/r + L²/(2r²) − ML²/r³ (Hartle (2003) eq. 9.30 with G = c = 1)
    expect(same(v.perUnitMass.effectivePotential.expr, "-G*M/r + L^2/(2*r^2) - G*M*L^2/r^3")).toBe("equal");
  });

  it("refuses a metric that is not static and spherically symmetric", () => {
    const kerrLike = runVerb("potential", { coordinates: SPHERICAL, metric: "ds^2 = -c^2 dt^2 + 2 a\\,dt\\,d\\phi + dr^2 + r^2 d\\theta^2 + r^2\\sin^2\\theta\\,d\\phi^2" });
    expect(kerrLike).toMatchObject({ ok: false, error: { code: "malformed" } });
  });
});
