import { describe, expect, it } from "vitest";
import katex from "katex";
import { toLatex } from "@/cas/print";
import { readLatex, readLatexExpr } from "@/cas/parse";
import { add, call, deriv, differential, div, dot, limit, mul, neg, num, pow, relation, sub, sym, infinity } from "@/cas/expr/build";
import type { Expr } from "@/cas/expr/types";
import { RELATIVITY_CORPUS } from "../parse/relativity-corpus";
import { DECLARED_FUNCTIONS, generator, randomTree } from "./random-tree";

describe("toLatex", () => {
  it("prints fractions, powers and subscripts the KaTeX way", () => {
    expect(toLatex(mul(sub(num(1), div(sym("r_s"), sym("r"))), pow(sym("c"), num(2))))).toBe("\\left(1 - \\frac{r_{s}}{r}\\right) c^{2}");
    expect(toLatex(div(mul(sym("G"), sym("M")), pow(sym("r"), num(2))))).toBe("\\frac{G M}{r^{2}}");
    expect(toLatex(sym("g_tt"))).toBe("g_{tt}");
    expect(toLatex(sym("M_odot"))).toBe("M_{\\odot}");
    expect(toLatex(sym("V_eff"))).toBe("V_{\\mathrm{eff}}");
  });

  it("uses plain parentheses around short content and \\left( \\right) around tall content", () => {
    expect(toLatex(mul(sym("r"), add(sym("a"), sym("b"))))).toBe("r \\cdot (a + b)");
    expect(toLatex(mul(sym("r"), add(sym("a"), div(sym("b"), sym("c")))))).toBe("r \\cdot \\left(a + \\frac{b}{c}\\right)");
    expect(toLatex(pow(add(sym("a"), sym("b")), num(2)))).toBe("(a + b)^{2}");
  });

  it("prints no parentheses that precedence makes needless", () => {
    expect(toLatex(add(sym("a"), mul(sym("b"), sym("c"))))).toBe("a + b c");
    expect(toLatex(neg(pow(sym("x"), num(2))))).toBe("-x^{2}");
    expect(toLatex(add(sym("a"), neg(sym("b"))))).toBe("a - b");
    expect(toLatex(pow(sym("x"), add(sym("a"), sym("b"))))).toBe("x^{a + b}");
  });

  it("prints trigonometric powers as \\sin^{2}\\theta and separates a bare argument from what follows", () => {
    expect(toLatex(pow(call("sin", sym("theta")), num(2)))).toBe("\\sin^{2}\\theta");
    expect(toLatex(mul(pow(call("sin", sym("theta")), num(2)), pow(differential("phi"), num(2))))).toBe("\\sin^{2}\\theta\\, \\mathrm{d}\\phi^{2}");
    expect(toLatex(mul(call("sin", sym("theta")), sym("r")))).toBe("\\sin\\theta\\, r");
    expect(toLatex(pow(call("sin", sym("theta")), neg(num(1))))).toBe("(\\sin\\theta)^{-1}");
    expect(toLatex(call("log", sym("r")))).toBe("\\ln r");
  });

  it("prints dots, differentials, derivatives and limits", () => {
    expect(toLatex(dot("r"))).toBe("\\dot{r}");
    expect(toLatex(dot("phi", 2))).toBe("\\ddot{\\phi}");
    expect(toLatex(dot("r", 4))).toBe("\\frac{\\mathrm{d}^{4} r}{\\mathrm{d}\\tau^{4}}");
    expect(toLatex(differential("t"))).toBe("\\mathrm{d}t");
    expect(toLatex(deriv(sym("f"), "r", 1, true))).toBe("\\frac{\\partial f}{\\partial r}");
    expect(toLatex(deriv(add(sym("a"), sym("r")), "r", 2))).toBe("\\frac{\\mathrm{d}^{2}}{\\mathrm{d} r^{2}}\\left(a + r\\right)");
    expect(toLatex(limit(div(num(1), sym("c")), "c", infinity))).toBe("\\lim_{c \\to \\infty} \\frac{1}{c}");
  });

  it("prints scientific literals and relations", () => {
    expect(toLatex(num("6.674e-11"))).toBe("6.674 \\times 10^{-11}");
    expect(toLatex(relation(sym("r"), ">=", num(3)))).toBe("r \\ge 3");
    expect(toLatex(relation(sym("a"), "!=", num(0)))).toBe("a \\neq 0");
  });

  it("is total: a tree too deep to print gives a marker, not an exception", () => {
    let deep: Expr = sym("x");
    for (let i = 0; i < 200_000; i += 1) deep = neg(deep);
    expect(toLatex(deep)).toMatch(/too deep/);
  });

  it("is deterministic", () => {
    for (const entry of RELATIVITY_CORPUS) {
      const tree = readLatex(entry.latex, entry.options);
      expect(toLatex(tree)).toBe(toLatex(structuredClone(tree)));
    }
  });
});

describe("toLatex output renders in KaTeX", () => {
  it.each(RELATIVITY_CORPUS.map((c) => [c.latex, c] as const))("%s", (_latex, entry) => {
    const printed = toLatex(readLatex(entry.latex, entry.options));
    expect(() => katex.renderToString(printed, { throwOnError: true, strict: "error" })).not.toThrow();
  });
});

describe("toLatex then readLatex on random trees", () => {
  it("gives back the same tree for 400 random trees", () => {
    const next = generator(7);
    for (let i = 0; i < 400; i += 1) {
      const tree = randomTree(next, 4);
      const printed = toLatex(tree);
      const back = readLatexExpr(printed, { functions: DECLARED_FUNCTIONS });
      expect(back, printed).toEqual(tree);
    }
  });
});
