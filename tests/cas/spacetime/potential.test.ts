import { describe, expect, it } from "vitest";
import { readPlainExpr } from "@/cas/parse/plain";
import { toPlain } from "@/cas/print/plain";
import { probeEqual } from "@/cas/simplify/probe";
import { effectivePotential } from "@/cas/spacetime/potential";
import * as M from "./metrics";

describe("effectivePotential", () => {
  it("Reissner–Nordström adds a charge term that vanishes as c → ∞", () => {
    // r_Q^2 = G Q^2/(4π ε0 c^4) (Carroll (2004) eq. 5.139); V_eff = ½μc²(A − 1) + L²A/(2μr²)
    const v = effectivePotential(M.metricOf(M.REISSNER_NORDSTROM), {
      r_s: readPlainExpr("2*G*M/c^2"),
      r_Q: readPlainExpr("sqrt(G/(4*pi*epsilon_0))*Q/c^2"),
    });
    expect(v.abIsOne).toBe(true);
    const names = v.terms.map((t) => t.name);
    expect(names.filter((n) => n === "relativistic correction").length).toBeGreaterThanOrEqual(2);
    expect(names).toContain("Newtonian attraction");
    expect(names).toContain("centrifugal");
  });

  it("keeps A·B in the kinetic term when A·B ≠ 1", () => {
    const v = effectivePotential(M.metricOf(M.STATIC_SPHERICAL));
    expect(v.abIsOne).toBe(false);
    expect(toPlain(v.radialEquation)).toContain("A(r)*B(r)*dot(r)^2");
    // ½μc²(A − 1) + L²A/(2μr²), the definition
    expect(probeEqual(v.effectivePotential, readPlainExpr("mu*c^2*(A(r) - 1)/2 + L^2*A(r)/(2*mu*r^2)", { functions: ["A"] })).kind).toBe("equal");
  });

  it("in geometric units gives no c → ∞ limits and names terms by their power of r", () => {
    const v = effectivePotential(M.metricOf(M.SCHWARZSCHILD), { r_s: readPlainExpr("2*M"), c: readPlainExpr("1") });
    expect(v.terms.map((t) => t.name)).toEqual(["Newtonian attraction", "centrifugal", "relativistic correction"]); // Hartle (2003) eq. 9.30
    expect(v.terms.every((t) => t.limit === null)).toBe(true);
  });
});
