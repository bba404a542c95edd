import { describe, expect, it } from "vitest";
import { runVerb } from "@/cas/api";
import { readPlainExpr } from "@/cas/parse/plain";
import { probeEqual } from "@/cas/simplify/probe";
import { SCHWARZSCHILD_RS, SPHERICAL } from "./spacetime-fixtures";

type Symbolic = { latex: string; expr: string };
type Listed = Symbolic & { index: number[] };

describe("curvature verb", () => {
  it("answers the curvature sheet of Schwarzschild from its LaTeX line element", () => {
    const out = runVerb("curvature", { coordinates: SPHERICAL, metric: SCHWARZSCHILD_RS, symbols: ["r_s"] });
    expect(out.ok).toBe(true);
    const sheet = (out as { value: Record<string, unknown> }).value as {
      christoffel: Listed[]; riemann: Listed[]; ricci: Listed[]; einstein: Listed[]; ricciScalar: Symbolic; kretschmann: Symbolic;
      conventions: Record<string, unknown>; timings: Record<string, number>;
    };
    expect(Object.keys(sheet).sort()).toEqual(["christoffel", "conventions", "einstein", "kretschmann", "ricci", "ricciScalar", "riemann", "timings"]);
    expect(sheet.ricci).toEqual([]); // MTW (1973) §31: vacuum
    expect(sheet.ricciScalar.expr).toBe("0");
    // MTW (1973) §31: K = 12 r_s^2/r^6
    expect(probeEqual(readPlainExpr(sheet.kretschmann.expr), readPlainExpr("12*r_s^2/r^6")).kind).toBe("equal");
    expect(sheet.kretschmann.latex).toContain("\\frac");
    for (const c of sheet.christoffel) expect(c.index[1]).toBeLessThanOrEqual(c.index[2]);
    for (const c of sheet.riemann) expect(c.index[2]).toBeLessThan(c.index[3]);
    expect(sheet.conventions.signature).toBe("(-,+,+,+)");
    expect(String(sheet.conventions.riemann)).toContain("\\partial_c");
    expect(typeof sheet.timings.total).toBe("number");
    expect(String(sheet.conventions.verification)).toMatch(/2 random points \(31-digit arithmetic, to within 1e-11 relative\).*not a proof/);
  });

  it("accepts a components matrix with a cross term", () => {
    const out = runVerb("curvature", {
      coordinates: ["t", "x"],
      components: [["-1", "0"], ["0", "a(t)^2"]],
      functions: ["a"],
    });
    expect(out.ok).toBe(true);
  });

  it("refuses a malformed request with a clear error", () => {
    const both = runVerb("curvature", { coordinates: SPHERICAL, metric: SCHWARZSCHILD_RS, components: [["1"]] });
    expect(both.ok).toBe(false);
    const asymmetric = runVerb("curvature", { coordinates: ["t", "x"], components: [["-1", "x"], ["0", "1"]] });
    expect(asymmetric).toMatchObject({ ok: false, error: { code: "malformed" } });
    expect((asymmetric as { error: { message: string } }).error.message).toContain("symmetric");
    const degenerate = runVerb("curvature", { coordinates: ["t", "x"], components: [["1", "1"], ["1", "1"]] });
    expect(degenerate).toMatchObject({ ok: false, error: { code: "malformed" } });
    const unreadable = runVerb("curvature", { coordinates: SPHERICAL, metric: "ds^2 = -\\frac{1}{" });
    expect(unreadable).toMatchObject({ ok: false, error: { code: "unreadable" } });
    const notQuadratic = runVerb("curvature", { coordinates: ["t", "x"], metric: "ds^2 = dt^3 + dx^2" });
    expect(notQuadratic).toMatchObject({ ok: false, error: { code: "malformed" } });
  });
});
