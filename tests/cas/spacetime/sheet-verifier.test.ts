import { describe, expect, it } from "vitest";
import { readPlainExpr } from "@/cas/parse/plain";
import { decimalContext } from "@/cas/numeric/evaluate";
import { ddArithmetic, decimalArithmetic } from "@/cas/numeric/arithmetic";
import { rawDerivatives } from "@/cas/spacetime/numeric-curvature";
import { SheetVerifier } from "@/cas/spacetime/sheet-verifier";
import * as M from "./metrics";

function checks<N>(v: SheetVerifier<N>): void {
  const agrees = (text: string, pick: Parameters<SheetVerifier<N>["agrees"]>[1]) => v.agrees(readPlainExpr(text), pick);

  it(`${v.digits} digits: accepts the right forms and rejects near misses`, () => {
    // K = 12 r_s^2/r^6: MTW (1973) §31 (48 G^2 M^2/(c^4 r^6) with r_s = 2GM/c^2).
    expect(agrees("12*r_s^2/r^6", (at) => at.kretschmann)).toBe(true);
    // Off by one part in 10^9: beyond the 1e-11 tolerance.
    expect(agrees("12.000000012*r_s^2/r^6", (at) => at.kretschmann)).toBe(false);
    // Off by one part in 10^14: within it (the check is to 1e-11, not exact).
    expect(agrees("12.00000000000012*r_s^2/r^6", (at) => at.kretschmann)).toBe(true);
    // Γ^r_tt = c^2 r_s (r − r_s)/(2 r^3) (Carroll (2004) eq. 5.53 with c restored); the opposite sign fails.
    expect(agrees("c^2*r_s*(r - r_s)/(2*r^3)", (at) => at.christoffel[1][0][0])).toBe(true);
    expect(agrees("c^2*r_s*(r_s - r)/(2*r^3)", (at) => at.christoffel[1][0][0])).toBe(false);
    // A form with no value at the points does not agree.
    expect(agrees("sqrt(r_s - r - 10)", (at) => at.kretschmann)).toBe(false);
  });

  it(`${v.digits} digits: the raw Ricci tensor vanishes and K does not (MTW (1973) §31: vacuum, K ≠ 0)`, () => {
    const scale = (at: { riemann: N[][][][] }) => at.riemann[1][0][1][0];
    for (let a = 0; a < 4; a += 1) for (let b = 0; b < 4; b += 1) expect(v.vanishes((at) => at.ricci[a][b], scale)).toBe(true);
    expect(v.vanishes((at) => at.kretschmann, scale)).toBe(false);
  });
}

describe("sheet verifier (Schwarzschild), in double-double and in decimal.js", () => {
  const raw = rawDerivatives(M.metricOf(M.SCHWARZSCHILD));
  checks(new SheetVerifier(ddArithmetic, decimalContext(40), raw, 2, 1e-11));
  checks(new SheetVerifier(decimalArithmetic(decimalContext(25)), decimalContext(25), raw, 2, 1e-11));
});
