import { describe, expect, it } from "vitest";
import { leadingPower } from "../../../cas/limit/leading-power";
import { readPlainExpr } from "../../../cas/parse/plain";

describe("leadingPower", () => {
  it("reads the formal power of c in the effective potential's terms (Carroll (2004) ch. 5)", () => {
    expect(leadingPower(readPlainExpr("G*M*L^2/(mu*c^2*r^3)"), "c")).toBe(-2);
    expect(leadingPower(readPlainExpr("(1 - r_s/r)*c^2"), "c")).toBe(2);
    expect(leadingPower(readPlainExpr("sqrt(c)"), "c")).toBe(0.5);
    expect(leadingPower(readPlainExpr("sin(c)"), "c")).toBeNull();
  });
});
