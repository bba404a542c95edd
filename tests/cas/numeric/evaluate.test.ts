import { describe, expect, it } from "vitest";
import { decimalContext, evaluateDecimal } from "../../../cas/numeric/evaluate";
import { readPlainExpr } from "../../../cas/parse/plain";

describe("evaluateDecimal (extended: cached π per precision)", () => {
  it("gives π to the context's precision, at two precisions in turn", () => {
    // π to 45 digits: 3.14159265358979323846264338327950288419716939937… (OEIS A000796).
    expect(evaluateDecimal(decimalContext(45), readPlainExpr("pi"), { values: {} }).toString()).toBe("3.1415926535897932384626433832795028841971694");
    expect(evaluateDecimal(decimalContext(20), readPlainExpr("pi"), { values: {} }).toString()).toBe("3.1415926535897932385");
  });
});
