import { describe, expect, it } from "vitest";
import { auditStatement, dimensionOf, type DimensionEnvironment } from "../../../cas/dims/audit";
import { parseDimension, formatDimension } from "../../../cas/dims/dimension";
import { readPlain, readPlainExpr } from "../../../cas/parse/plain";

const env = (symbols: Record<string, string | null>, parameter = "tau"): DimensionEnvironment => ({
  symbols: new Map(Object.entries(symbols).map(([k, v]) => [k, v === null ? null : parseDimension(v)])),
  parameter,
});
const orbit = env({ r: "length", r_s: "length", M: "mass", mu: "mass", L: "angular momentum", E: "energy", tau: "time", t: "time", V: "energy" });

describe("dimension audit", () => {
  it("finds the three terms of V_eff all energies (Carroll (2004) ch. 5: −GMμ/r + L²/2μr² − GML²/μc²r³)", () => {
    const a = auditStatement(readPlain("V = -G*M*mu/r + L^2/(2*mu*r^2) - G*M*L^2/(mu*c^2*r^3)"), orbit);
    expect(a.status).toBe("consistent");
    expect(a.terms.map((t) => t.outcome.kind === "known" && formatDimension(t.outcome.dimension))).toEqual(Array(4).fill("M L^2 T^-2"));
  });

  it("points at the term that lost its c² (ours: a broken twin)", () => {
    const a = auditStatement(readPlain("V = -G*M*mu/r + L^2/(2*mu*r^2) - G*M*L^2/(mu*r^3)"), orbit);
    expect(a.status).toBe("inconsistent");
    expect(a.odd).toBe(3);
  });

  it("gives a dotted length by a time the dimension of a velocity (issue 3)", () => {
    const d = dimensionOf(readPlainExpr("dot(r)"), orbit);
    expect(d.kind === "known" && formatDimension(d.dimension)).toBe("L T^-1");
  });

  it("says unknown, never guesses, for an undeclared symbol", () => {
    const a = auditStatement(readPlain("x = r"), orbit);
    expect(a.status).toBe("unknown");
    expect(a.unknownSymbols).toEqual(["x"]);
  });

  it("needs dimensionless arguments of sin, exp and log", () => {
    const a = auditStatement(readPlainExpr("sin(r) + 1"), orbit);
    expect(a.status).toBe("inconsistent");
    expect(a.problems[0]).toMatch(/argument of sin has dimension L/);
    expect(auditStatement(readPlainExpr("exp(-r/r_s) + 1"), orbit).status).toBe("consistent");
  });

  it("lets a declared G override the built-in one (geometric units)", () => {
    const geometric = env({ G: "dimensionless", c: "dimensionless", M: "length", r: "length" });
    expect(auditStatement(readPlain("1 - 2*G*M/r = 0"), geometric).status).toBe("consistent");
  });
});
