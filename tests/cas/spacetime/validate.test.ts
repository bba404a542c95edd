import { describe, expect, it } from "vitest";
import { readPlainExpr } from "@/cas/parse/plain";
import { metricFromComponents, MetricError } from "@/cas/spacetime/metric";
import { validateMetric } from "@/cas/spacetime/validate";
import * as M from "./metrics";

const m = (rows: string[][], coords: string[]) => metricFromComponents(rows.map((r) => r.map((s) => readPlainExpr(s))), coords);

describe("validateMetric", () => {
  it("reports a Lorentzian signature (-,+,+,+) whatever the coordinate order", () => {
    expect(validateMetric(M.metricOf(M.KERR)).text).toBe("(-,+,+,+)");
    // Vaidya's g has no diagonal time part yet is Lorentzian (Griffiths & Podolský (2009) §9.5)
    expect(validateMetric(M.metricOf(M.VAIDYA)).lorentzian).toBe(true);
    expect(validateMetric(m([["1", "0"], ["0", "r^2"]], ["r", "phi"])).text).toBe("(+,+)");
  });

  it("refuses an asymmetric or degenerate matrix, and one of the wrong size", () => {
    expect(() => validateMetric(m([["-1", "x"], ["0", "1"]], ["t", "x"]))).toThrow(/symmetric/);
    expect(() => validateMetric(m([["x", "x"], ["x", "x"]], ["t", "x"]))).toThrow(/degenerate/);
    expect(() => m([["1"]], ["t", "x"])).toThrow(MetricError);
  });
});
