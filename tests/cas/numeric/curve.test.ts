import { describe, expect, it } from "vitest";
import { readPlainExpr } from "@/cas/parse/plain";
import { curveExtrema, sampleCurve } from "@/cas/numeric/curve";

describe("sampleCurve", () => {
  it("samples evenly and keeps both ends", () => {
    const points = sampleCurve(readPlainExpr("1 - r_s/r"), "r", { values: { r_s: 1 }, from: 1, to: 4, count: 4 });
    expect(points.map((p) => p.x)).toEqual([1, 2, 3, 4]);
    expect(points.map((p) => p.y)).toEqual([0, 0.5, 1 - 1 / 3, 0.75]);
  });

  it("spaces samples geometrically on request", () => {
    const points = sampleCurve(readPlainExpr("r"), "r", { values: {}, from: 1, to: 100, count: 3, spacing: "log" });
    expect(points[1].x).toBeCloseTo(10, 12);
  });

  it("leaves a gap (null) where the expression has no value instead of throwing", () => {
    const points = sampleCurve(readPlainExpr("sqrt(x)"), "x", { values: {}, from: -1, to: 1, count: 3 });
    expect(points.map((p) => p.y)).toEqual([null, 0, 1]);
  });
});

describe("curveExtrema", () => {
  it("finds the minimum and maximum of the Schwarzschild effective potential at the circular orbits", () => {
    // per unit mass, G = c = 1, M = 1: V = −1/r + L²/(2r²) − L²/r³; circular orbits at
    // r = (L² ± L√(L² − 12))/2 (Hartle, Gravity (2003), ch. 9); L² = 16 gives r = 4 and 12
    const v = readPlainExpr("-1/r + L^2/(2*r^2) - L^2/r^3");
    const found = curveExtrema(sampleCurve(v, "r", { values: { L: 4 }, from: 2.5, to: 40, count: 800, spacing: "log" }));
    expect(found.map((x) => x.kind)).toEqual(["maximum", "minimum"]);
    expect(found[0].x).toBeCloseTo(4, 2);
    expect(found[1].x).toBeCloseTo(12, 1);
  });
});
