import { describe, expect, it } from "vitest";
import { concreteFunction } from "../../../cas/numeric/concrete-functions";
import { randomStream } from "../../../cas/numeric/random";
import { evaluateFloat } from "../../../cas/numeric/evaluate";
import { readPlainExpr } from "../../../cas/parse/plain";
import { sym } from "../../../cas/expr/build";

describe("concreteFunction", () => {
  it("is a positive smooth function whose formula matches its tree", () => {
    const f = concreteFunction(1, randomStream(4));
    const tree = f.apply([sym("r")]);
    const formula = readPlainExpr(f.formula.replace(/x1/g, "r"));
    for (const r of [0.5, 1.3, 2.9]) {
      expect(evaluateFloat(tree, { values: { r } })).toBeGreaterThan(0);
      expect(evaluateFloat(tree, { values: { r } })).toBeCloseTo(evaluateFloat(formula, { values: { r } }), 12);
    }
  });

  it("differs between draws", () => {
    expect(concreteFunction(1, randomStream(1)).formula).not.toBe(concreteFunction(1, randomStream(2)).formula);
  });
});
