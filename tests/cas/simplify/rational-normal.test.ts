import { describe, expect, it } from "vitest";
import { readPlainExpr } from "@/cas/parse/plain";
import { toPlain } from "@/cas/print/plain";
import { rationalCandidates, rationalNormal } from "@/cas/simplify/rational-normal";

const p = (s: string) => readPlainExpr(s, { functions: ["A"] });

describe("rational normal form", () => {
  it("puts a sum over one denominator and cancels", () => {
    expect(toPlain(rationalNormal(p("1/(r - r_s) - 1/r")))).toBe("r_s/(r*(r - r_s))");
    expect(toPlain(rationalNormal(p("(r^3 - r*r_s^2)/(r^2 + r*r_s)")))).toBe("r - r_s");
  });

  it("recognises zero through sin^2 + cos^2 = 1", () => {
    expect(toPlain(rationalNormal(p("(sin(th)^2 + cos(th)^2 - 1)*r/(r - 1)")))).toBe("0");
    expect(toPlain(rationalNormal(p("cos(th)^4 - (1 - sin(th)^2)^2")))).toBe("0");
  });

  it("differentiates undetermined functions through deriv nodes", () => {
    expect(toPlain(rationalNormal(p("diff(A(r)/r, r)*r^2 + A(r)")))).toBe("r*diff(A(r), r)");
  });

  it("gives no candidates for what it cannot read", () => {
    expect(rationalCandidates(p("limit(1/c, c, infinity)"))).toEqual([]);
    expect(rationalCandidates(p("(x+1)^100000"))).toEqual([]);
  });
});
