import { describe, expect, it } from "vitest";
import { toPlain } from "@/cas/print";
import { readLatex, readPlain, readPlainExpr } from "@/cas/parse";
import { add, call, deriv, differential, div, dot, euler, limit, mul, neg, num, pi, pow, relation, sub, sym, infinity } from "@/cas/expr/build";
import type { Expr } from "@/cas/expr/types";
import { RELATIVITY_CORPUS } from "../parse/relativity-corpus";
import { generator, randomTree } from "./random-tree";

describe("toPlain", () => {
  it("prints the calculator syntax with the fewest parentheses", () => {
    expect(toPlain(mul(sub(num(1), div(sym("r_s"), sym("r"))), pow(sym("c"), num(2))))).toBe("(1 - r_s/r)*c^2");
    expect(toPlain(div(mul(sym("G"), sym("M")), mul(sym("r"), pow(sym("c"), num(2)))))).toBe("G*M/(r*c^2)");
    expect(toPlain(neg(pow(sym("x"), num(2))))).toBe("-x^2");
    expect(toPlain(pow(sym("x"), neg(num(1))))).toBe("x^(-1)");
    expect(toPlain(pow(pow(sym("a"), sym("b")), sym("c")))).toBe("(a^b)^c");
    expect(toPlain(pow(sym("a"), pow(sym("b"), sym("c"))))).toBe("a^b^c");
    expect(toPlain(div(sym("a"), div(sym("b"), sym("c"))))).toBe("a/(b/c)");
    expect(toPlain(mul(sym("a"), div(sym("b"), sym("c"))))).toBe("a*(b/c)");
  });

  it("prints constants and the calculus forms", () => {
    expect(toPlain(add(pi, euler, infinity))).toBe("pi + e + infinity");
    expect(toPlain(dot("r"))).toBe("dot(r)");
    expect(toPlain(dot("r", 2))).toBe("ddot(r)");
    expect(toPlain(dot("r", 3))).toBe("dot(r, 3)");
    expect(toPlain(differential("t"))).toBe("d(t)");
    expect(toPlain(deriv(sym("f"), "r", 2))).toBe("diff(f, r, 2)");
    expect(toPlain(deriv(sym("L"), "r_dot", 1, true))).toBe("pdiff(L, r_dot)");
    expect(toPlain(limit(div(num(1), sym("c")), "c", infinity))).toBe("limit(1/c, c, infinity)");
    expect(toPlain(call("A", sym("r"), sym("theta")))).toBe("A(r, theta)");
  });

  it("prints relations", () => {
    expect(toPlain(relation(sym("r"), ">", sym("r_s")))).toBe("r > r_s");
    expect(toPlain(relation(sym("a"), "!=", num(0)))).toBe("a != 0");
  });

  it("prints the identifiers the API promises: LaTeX without backslashes, subscripts as _x", () => {
    expect(toPlain(readLatex("\\theta + r_{s} + g_{tt} + M_\\odot"))).toBe("theta + r_s + g_tt + M_odot");
  });

  it("is total: a tree too deep to print gives a marker, not an exception", () => {
    let deep: Expr = sym("x");
    for (let i = 0; i < 200_000; i += 1) deep = neg(deep);
    expect(toPlain(deep)).toMatch(/too deep/);
  });

  it("gives back the same tree through readPlain for 400 random trees", () => {
    const next = generator(11);
    for (let i = 0; i < 400; i += 1) {
      const tree = randomTree(next, 4);
      const printed = toPlain(tree);
      expect(readPlainExpr(printed), printed).toEqual(tree);
    }
  });

  it("is deterministic on the corpus", () => {
    for (const entry of RELATIVITY_CORPUS) {
      const tree = readLatex(entry.latex, entry.options);
      expect(readPlain(toPlain(tree), entry.options)).toEqual(tree);
    }
  });
});
