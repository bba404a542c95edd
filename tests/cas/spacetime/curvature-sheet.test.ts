import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import Decimal from "decimal.js";
import { readPlainExpr } from "@/cas/parse/plain";
import { toPlain } from "@/cas/print/plain";
import { num, sym, mul } from "@/cas/expr/build";
import { substitute } from "@/cas/expr/traverse";
import { decimalContext, evaluateDecimal } from "@/cas/numeric/evaluate";
import { freeNamesOf, jetify, probeEqual, randomSource, randomValues } from "@/cas/simplify/probe";
import { computeCurvature, computeCurvatureSync, type CurvatureSheet, type TensorComponent } from "@/cas/spacetime/curvature-sheet";
import { rawDerivatives } from "@/cas/spacetime/numeric-curvature";
import * as M from "./metrics";

const equal = (a: ReturnType<typeof readPlainExpr>, b: ReturnType<typeof readPlainExpr>) => probeEqual(a, b).kind;

describe("curvature sheet: textbook checks", () => {
  it("Schwarzschild is Ricci-flat with K = 12 r_s^2/r^6", () => {
    const sheet = computeCurvatureSync(M.metricOf(M.SCHWARZSCHILD));
    expect(sheet.ricci).toEqual([]); // MTW (1973) §31: vacuum solution
    expect(sheet.einstein).toEqual([]);
    expect(toPlain(sheet.ricciScalar)).toBe("0");
    // MTW (1973) §31 (48 G^2 M^2/(c^4 r^6) with r_s = 2GM/c^2)
    expect(equal(sheet.kretschmann, readPlainExpr("12*r_s^2/r^6"))).toBe("equal");
    expect(sheet.signature.text).toBe("(-,+,+,+)");
    // Γ^r_tt = c^2 r_s (r - r_s)/(2 r^3): Hartle (2003) ch. 9 / Carroll (2004) eq. 5.53 (with c restored)
    const gammaRtt = sheet.christoffel.find((c) => c.index.join() === "1,0,0");
    expect(equal(gammaRtt!.expr, readPlainExpr("c^2*r_s*(r - r_s)/(2*r^3)"))).toBe("equal");
  });

  it("Reissner–Nordström has R = 0 and an Einstein tensor proportional to Q^2", () => {
    const sheet = computeCurvatureSync(M.metricOf(M.REISSNER_NORDSTROM));
    expect(toPlain(sheet.ricciScalar)).toBe("0"); // Carroll (2004) §5.6: traceless electromagnetic stress tensor
    expect(sheet.einstein.length).toBeGreaterThan(0);
    for (const c of sheet.einstein) {
      // ∝ r_Q^2 = G Q^2/(4π ε0 c^4): vanishes with the charge (Carroll (2004) §5.6)
      expect(equal(substitute(c.expr, { r_Q: num(0) }), num(0))).toBe("equal");
      expect(equal(c.expr, num(0))).toBe("different");
    }
    // G_θθ = r_Q^2/r^2 (Carroll (2004) eq. 5.139 into G_ab = 8πG T_ab; from memory, checked against SymPy below)
    const gThetaTheta = sheet.einstein.find((c) => c.index.join() === "2,2");
    expect(equal(gThetaTheta!.expr, readPlainExpr("r_Q^2/r^2"))).toBe("equal");
  });

  it("Schwarzschild–de Sitter has R_ab = Λ g_ab", () => {
    const metric = M.metricOf(M.SCHWARZSCHILD_DE_SITTER);
    const sheet = computeCurvatureSync(metric);
    // vacuum with cosmological constant: R_ab = Λ g_ab (Carroll (2004) §4.5 eq. 4.50 with T = 0; Griffiths & Podolský (2009) §9.2)
    for (let a = 0; a < 4; a += 1) for (let b = a; b < 4; b += 1) {
      const listed = sheet.ricci.find((c) => c.index.join() === `${a},${b}`)?.expr ?? num(0);
      expect(equal(listed, mul(sym("Lambda"), metric.components[a][b]))).toBe("equal");
    }
    expect(toPlain(sheet.ricciScalar)).toBe("4*Lambda");
  });

  it("flat space in spherical coordinates has no curvature", () => {
    const sheet = computeCurvatureSync(M.metricOf(M.FLAT_SPHERICAL));
    expect(sheet.riemann).toEqual([]); // flat: common practice, no source needed
    expect(sheet.ricci).toEqual([]);
    expect(sheet.einstein).toEqual([]);
    expect(toPlain(sheet.kretschmann)).toBe("0");
    expect(sheet.christoffel.length).toBeGreaterThan(0); // curvilinear coordinates still have Γ
  });

  it("Kerr is Ricci-flat", () => {
    const sheet = computeCurvatureSync(M.metricOf(M.KERR));
    expect(sheet.ricci).toEqual([]); // MTW (1973) §33.2: vacuum solution
    expect(toPlain(sheet.ricciScalar)).toBe("0");
    expect(sheet.kretschmann.kind).not.toBe("num");
  });

  it("Vaidya's Kretschmann scalar is 48 m(v)^2/r^6", () => {
    const sheet = computeCurvatureSync(M.metricOf(M.VAIDYA));
    // Griffiths & Podolský (2009) §9.5: same K as Schwarzschild with m → m(v) (from memory; SymPy below agrees)
    expect(equal(sheet.kretschmann, readPlainExpr("48*m(v)^2/r^6", { functions: ["m"] }))).toBe("equal");
  });
});

describe("curvature sheet: how it is verified", () => {
  it("checks in double-double by default, and in decimal.js when asked for digits", () => {
    expect(computeCurvatureSync(M.metricOf(M.SCHWARZSCHILD)).verification).toEqual({ points: 2, digits: 31, tolerance: 1e-11, checked: 168 });
    const decimal = computeCurvatureSync(M.metricOf(M.SCHWARZSCHILD), { digits: 40 });
    expect(decimal.verification).toMatchObject({ points: 2, digits: 40 });
    expect(decimal.verification.tolerance).toBeCloseTo(1e-26, 30);
  });

  it("falls back to decimal.js when values leave double-double's range", () => {
    // Schwarzschild times the constant 10^-250: Γ and R^a_bcd are unchanged by a constant factor,
    // R_ab too, so R = 0 and K = 12 r_s^2/r^6 · 10^500 (common practice, no source; MTW (1973) §31 for K).
    const scaled = { ...M.SCHWARZSCHILD, components: M.SCHWARZSCHILD.components.map((row) => row.map((e) => (e === "0" ? e : `1e-250*(${e})`))) };
    const sheet = computeCurvatureSync(M.metricOf(scaled));
    expect(sheet.verification.digits).toBe(32);
    expect(toPlain(sheet.ricciScalar)).toBe("0");
    expect(equal(sheet.kretschmann, readPlainExpr("12e500*r_s^2/r^6"))).toBe("equal");
  });
});

describe("curvature sheet: progress and cancellation", () => {
  it("reports each stage and can be aborted", async () => {
    const stages: string[] = [];
    await computeCurvature(M.metricOf(M.SCHWARZSCHILD), { onProgress: (p) => stages.push(p.stage) });
    expect(stages).toEqual(["validate", "inverse", "christoffel", "riemann", "ricci", "kretschmann", "display"]);
    const controller = new AbortController();
    const run = computeCurvature(M.metricOf(M.KERR), { signal: controller.signal, onProgress: (p) => { if (p.stage === "inverse") controller.abort(new Error("stopped by the user")); } });
    await expect(run).rejects.toThrow("stopped by the user");
  });
});

// SymPy (Debian python3-sympy) is the reference here: it computes the same
// quantities from the same components, and both are evaluated at random points.
const SYMPY_SCRIPT = fileURLToPath(new URL("./sympy_sheet.py", import.meta.url));

function ours(list: readonly TensorComponent[], index: number[]): TensorComponent["expr"] {
  return list.find((c) => c.index.join() === index.join())?.expr ?? num(0);
}

function compareWithSympy(c: M.MetricCase): void {
  const metric = M.metricOf(c);
  const sheet: CurvatureSheet = computeCurvatureSync(metric);
  const D = decimalContext(30);
  const point = randomValues(D, freeNamesOf(rawDerivatives(metric).names), randomSource(99));
  const run = spawnSync("python3", [SYMPY_SCRIPT], {
    input: JSON.stringify({ coordinates: c.coordinates, components: c.components, functions: c.functions ?? [], points: [Object.fromEntries(Object.entries(point).map(([k, v]) => [k, v.toString()]))] }),
    encoding: "utf8",
    timeout: 120_000,
  });
  expect(run.status, run.stderr).toBe(0);
  const [ref] = JSON.parse(run.stdout);
  const value = (e: TensorComponent["expr"]) => evaluateDecimal(D, jetify(e), { values: point });
  const close = (got: Decimal, want: string, what: string) => {
    const w = new D(want);
    expect(got.minus(w).abs().lte(D.max(1, w.abs()).times("1e-18")), `${c.name} ${what}: ours ${got} SymPy ${want}`).toBe(true);
  };
  const n = c.coordinates.length;
  for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) for (let d = b; d < n; d += 1) close(value(ours(sheet.christoffel, [a, b, d])), ref.christoffel[a][b][d], `Γ[${a},${b},${d}]`);
  for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) for (let x = 0; x < n; x += 1) for (let y = x + 1; y < n; y += 1) close(value(ours(sheet.riemann, [a, b, x, y])), ref.riemann[a][b][x][y], `R[${a},${b},${x},${y}]`);
  for (let a = 0; a < n; a += 1) for (let b = a; b < n; b += 1) {
    close(value(ours(sheet.ricci, [a, b])), ref.ricci[a][b], `Ric[${a},${b}]`);
    close(value(ours(sheet.einstein, [a, b])), ref.einstein[a][b], `G[${a},${b}]`);
  }
  close(value(sheet.ricciScalar), ref.ricciScalar, "R");
  close(value(sheet.kretschmann), ref.kretschmann, "K");
}

describe("curvature sheet against SymPy, component by component at a random point", () => {
  for (const c of [M.SCHWARZSCHILD, M.REISSNER_NORDSTROM, M.SCHWARZSCHILD_DE_SITTER, M.STATIC_SPHERICAL, M.FLRW_FLAT, M.FLRW_CLOSED, M.VAIDYA]) {
    it(c.name, () => compareWithSympy(c), 120_000);
  }
});
