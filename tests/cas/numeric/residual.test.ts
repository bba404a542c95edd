import { describe, expect, it } from "vitest";
import { relativeSize, residual, signedTerms } from "../../../cas/numeric/residual";
import { decimalContext } from "../../../cas/numeric/evaluate";
import { readPlainExpr } from "../../../cas/parse/plain";

const D = decimalContext(40);

describe("residual", () => {
  it("measures a difference against the size of what cancelled", () => {
    const r = residual(D, readPlainExpr("x^2 - y^2"), readPlainExpr("(x-y)*(x+y)"), { x: new D(1e10), y: new D(3) });
    expect(relativeSize(r).lt(1e-35)).toBe(true);
    expect(signedTerms(readPlainExpr("a - (b + c)")).map((t) => t.sign)).toEqual([1, -1, -1]);
  });
});
