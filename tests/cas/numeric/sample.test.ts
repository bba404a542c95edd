import { describe, expect, it } from "vitest";
import { pointSampler, conditionHolds } from "../../../cas/numeric/sample";
import { decimalContext } from "../../../cas/numeric/evaluate";
import { randomStream } from "../../../cas/numeric/random";
import { readPlain, readPlainExpr } from "../../../cas/parse/plain";
import type { Relation } from "../../../cas/expr/types";

const D = decimalContext(40);
const rel = (s: string) => readPlain(s) as Relation;

describe("pointSampler", () => {
  it("respects bounds between variables (r > r_s, the Schwarzschild exterior: Hartle (2003) ch. 9)", () => {
    const draw = pointSampler(D, { variables: ["r", "r_s", "c"], fixed: [], conditions: [rel("r > r_s"), rel("c > 0")], signed: new Set() }, randomStream(1));
    for (let i = 0; i < 50; i += 1) {
      const p = draw()!;
      expect(p.r.gt(p.r_s)).toBe(true);
      expect(p.c.gt(0)).toBe(true);
    }
  });

  it("fixes θ = π/2 and draws signed variables on both sides of zero", () => {
    const draw = pointSampler(D, { variables: ["theta", "v"], fixed: [{ variable: "theta", value: readPlainExpr("pi/2") }], conditions: [], signed: new Set(["v"]) }, randomStream(2));
    const signs = new Set<number>();
    for (let i = 0; i < 40; i += 1) {
      const p = draw()!;
      expect(p.theta.toNumber()).toBeCloseTo(Math.PI / 2, 14);
      signs.add(p.v.s!);
    }
    expect(signs).toEqual(new Set([1, -1]));
  });

  it("returns null when the conditions cannot hold together", () => {
    const draw = pointSampler(D, { variables: ["x"], fixed: [], conditions: [rel("x > 2"), rel("x < 1")], signed: new Set() }, randomStream(3));
    expect(draw()).toBeNull();
  });

  it("evaluates conditions strictly", () => {
    expect(conditionHolds(D, rel("x > 1"), { x: new D(1) })).toBe(false);
    expect(conditionHolds(D, rel("x >= 1"), { x: new D(1) })).toBe(true);
  });
});
