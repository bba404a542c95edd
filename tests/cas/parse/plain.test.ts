import { describe, expect, it } from "vitest";
import { readPlain, readPlainExpr, parsePlain, ReadError } from "@/cas/parse";
import { add, call, deriv, differential, div, dot, euler, infinity, limit, mul, neg, num, pi, pow, relation, sym } from "@/cas/expr/build";
import { evaluateFloat } from "@/cas/numeric/evaluate";

describe("readPlain", () => {
  it("reads numbers, including exponents", () => {
    expect(readPlainExpr("6.674e-11")).toEqual(num("6.674e-11"));
    expect(readPlainExpr("0.5")).toEqual(num("0.5"));
    expect(readPlainExpr(".5")).toEqual(num(".5"));
    expect(readPlainExpr("299792458")).toEqual(num("299792458"));
  });

  it("reads identifiers with digits and underscores", () => {
    expect(readPlainExpr("r_s")).toEqual(sym("r_s"));
    expect(readPlainExpr("g_tt")).toEqual(sym("g_tt"));
    expect(readPlainExpr("theta")).toEqual(sym("theta"));
    expect(readPlainExpr("x2")).toEqual(sym("x2"));
  });

  it("reads the usual precedence: ^ over unary minus over * and / over + and -", () => {
    expect(readPlainExpr("-x^2")).toEqual(neg(pow(sym("x"), num(2))));
    expect(readPlainExpr("a - b*c")).toEqual(add(sym("a"), neg(mul(sym("b"), sym("c")))));
    expect(readPlainExpr("a*b/c")).toEqual(div(mul(sym("a"), sym("b")), sym("c")));
    expect(readPlainExpr("a/b*c")).toEqual(mul(div(sym("a"), sym("b")), sym("c")));
    expect(readPlainExpr("a/b/c")).toEqual(div(div(sym("a"), sym("b")), sym("c")));
    expect(readPlainExpr("x^-1")).toEqual(pow(sym("x"), neg(num(1))));
    expect(readPlainExpr("a*-b")).toEqual(mul(sym("a"), neg(sym("b"))));
  });

  it("reads ^ and ** right-associatively", () => {
    expect(readPlainExpr("a^b^c")).toEqual(pow(sym("a"), pow(sym("b"), sym("c"))));
    expect(readPlainExpr("a**b")).toEqual(pow(sym("a"), sym("b")));
  });

  it("reads the calculator form of the Schwarzschild factor as the LaTeX reader does", () => {
    // issue 3's example of the plain syntax
    expect(readPlainExpr("(1-r_s/r)*c^2")).toEqual(mul(add(num(1), neg(div(sym("r_s"), sym("r")))), pow(sym("c"), num(2))));
  });

  it("reads constants, and e as a symbol when declared", () => {
    expect(readPlainExpr("pi")).toEqual(pi);
    expect(readPlainExpr("e")).toEqual(euler);
    expect(readPlainExpr("infinity")).toEqual(infinity);
    expect(readPlainExpr("e", { symbols: ["e"] })).toEqual(sym("e"));
  });

  it("reads calls and the built-in aliases", () => {
    expect(readPlainExpr("sin(x)")).toEqual(call("sin", sym("x")));
    expect(readPlainExpr("ln(x)")).toEqual(call("log", sym("x")));
    expect(readPlainExpr("arcsin(x)")).toEqual(call("asin", sym("x")));
    expect(readPlainExpr("A(r)")).toEqual(call("A", sym("r")));
    expect(readPlainExpr("B(r, theta)")).toEqual(call("B", sym("r"), sym("theta")));
  });

  it("reads the calculus forms", () => {
    expect(readPlainExpr("dot(r)")).toEqual(dot("r"));
    expect(readPlainExpr("ddot(r)")).toEqual(dot("r", 2));
    expect(readPlainExpr("dot(r, 3)")).toEqual(dot("r", 3));
    expect(readPlainExpr("d(t)^2")).toEqual(pow(differential("t"), num(2)));
    expect(readPlainExpr("diff(f, r)")).toEqual(deriv(sym("f"), "r"));
    expect(readPlainExpr("diff(f, r, 2)")).toEqual(deriv(sym("f"), "r", 2));
    expect(readPlainExpr("pdiff(L, r_dot)")).toEqual(deriv(sym("L"), "r_dot", 1, true));
    expect(readPlainExpr("limit(1/c, c, infinity)")).toEqual(limit(div(num(1), sym("c")), "c", infinity));
  });

  it("lets a declared function shadow a calculus form", () => {
    expect(readPlainExpr("d(t)", { functions: ["d"] })).toEqual(call("d", sym("t")));
  });

  it("reads relations", () => {
    expect(readPlain("r > r_s")).toEqual(relation(sym("r"), ">", sym("r_s")));
    for (const op of ["=", "<", ">", "<=", ">=", "!="]) expect((readPlain(`a ${op} b`) as { op: string }).op).toBe(op);
  });

  it("evaluates as written: the Newtonian potential at the Earth's surface", () => {
    // G from CODATA 2018, M and R of the Earth from IAU 2015 Resolution B3 nominal values (GM = 3.986004e14 m^3 s^-2, R = 6.3781e6 m)
    const phi = readPlainExpr("-G*M/R");
    const value = evaluateFloat(phi, { values: { G: 6.6743e-11, M: 3.986004e14 / 6.6743e-11, R: 6.3781e6 } });
    expect(value).toBeCloseTo(-3.986004e14 / 6.3781e6, 3);
  });

  it("rejects a relation where an expression is wanted", () => {
    expect(() => readPlainExpr("a = b")).toThrow(ReadError);
  });

  it("keeps parsePlain as the name older code uses", () => {
    expect(parsePlain("x")).toEqual(sym("x"));
  });
});
