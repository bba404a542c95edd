import { describe, expect, it } from "vitest";
import { decimalContext, evaluateDecimal, EvaluationError } from "@/cas/numeric/evaluate";
import { ddArithmetic, decimalArithmetic, OutOfRangeError } from "@/cas/numeric/arithmetic";
import { compileTree, fillSlots, SlotNames } from "@/cas/numeric/compile";
import { ddToDecimal, type DD } from "@/cas/numeric/double-double";
import { readPlainExpr } from "@/cas/parse/plain";
import { freezeTrig } from "@/cas/simplify/probe";

// Reference: the tree walker evaluateDecimal at 50 digits (what verification used before compiling).
const D = decimalContext(50);
const point = { r: new D("1.734218845123"), r_s: new D("0.912744310058"), theta: new D("1.204519336671"), a: new D("0.687312004455") };

function compiledDD(text: string, at: Record<string, InstanceType<typeof D>> = point): DD {
  const names = new SlotNames();
  const run = compileTree(ddArithmetic, freezeTrig(readPlainExpr(text)), names);
  const slots: (DD | undefined)[] = [];
  fillSlots(ddArithmetic, names, at, slots);
  return run(slots as DD[]);
}

describe("compiled evaluation", () => {
  it("matches evaluateDecimal to ~1e-30 in double-double", () => {
    for (const text of [
      "c0 + (1 - r_s/r)^3 * r^-2",
      "r_s^2*(r - r_s)/(2*r^3) - sin(theta)^2*cos(theta)/(r^2 + a^2*cos(theta)^2)",
      "sqrt(r^2 - r_s*r) + r^(3/2) + r^0.5 + abs(r_s - r) + exp(r_s/r) + log(r) + tan(theta) + sin(2*theta) + pi",
      "(r^2 + a^2)^2 - a^2*(r^2 - r_s*r + a^2)*sin(theta)^2",
    ]) {
      const values = { ...point, c0: new D(3) };
      const want = evaluateDecimal(D, readPlainExpr(text), { values });
      const got = ddToDecimal(D, compiledDD(text, values));
      expect(got.minus(want).abs().div(D.max(1, want.abs())).toNumber(), text).toBeLessThan(1e-29);
    }
  });

  it("raises the errors evaluateDecimal raises", () => {
    expect(() => compiledDD("1/(r - r)")).toThrow(/division by zero/);
    expect(() => compiledDD("sqrt(r_s - r)")).toThrow(/square root of a negative/);
    expect(() => compiledDD("log(r_s - r)")).toThrow(EvaluationError);
    expect(() => compiledDD("(r_s - r)^(1/3)")).toThrow(/negative number raised/);
    expect(() => compiledDD("q + r")).toThrow(/no value for q/);
  });

  it("refuses values outside double-double's safe range instead of losing digits", () => {
    // 1e-250 · 1e-250 would underflow to 0 in float64; decimal.js has no such limit.
    expect(() => compiledDD("1e-250*r")).toThrow(OutOfRangeError);
    expect(() => compiledDD("(1e-150*r)^2")).toThrow(OutOfRangeError);
    expect(() => compiledDD("r^4000")).toThrow(OutOfRangeError);
    const names = new SlotNames();
    const run = compileTree(decimalArithmetic(D), readPlainExpr("(1e-150*r)^2"), names);
    const slots: (InstanceType<typeof D> | undefined)[] = [];
    fillSlots(decimalArithmetic(D), names, point, slots);
    expect(run(slots as InstanceType<typeof D>[]).toString()).toBe(new D("1e-300").times(point.r.pow(2)).toString());
  });
});
