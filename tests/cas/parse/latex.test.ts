import { describe, expect, it } from "vitest";
import { readLatex, readLatexExpr, readPlain, ReadError } from "@/cas/parse";
import { toLatex, toPlain } from "@/cas/print";
import { exprEquals } from "@/cas/expr/traverse";
import { add, call, deriv, differential, div, dot, euler, infinity, limit, mul, neg, num, pi, pow, relation, sym } from "@/cas/expr/build";
import { dotVariable, type Statement } from "@/cas/expr/types";
import { RELATIVITY_CORPUS } from "./relativity-corpus";
import { sameValue } from "./same-value";

const same = (a: Statement, b: Statement) => JSON.stringify(a) === JSON.stringify(b);

describe("readLatex on the relativity corpus", () => {
  it("has at least 60 inputs", () => {
    expect(RELATIVITY_CORPUS.length).toBeGreaterThanOrEqual(60);
  });

  describe.each(RELATIVITY_CORPUS.map((c) => [c.latex, c] as const))("%s", (_latex, entry) => {
    it(`means what ${entry.source} says`, () => {
      const read = readLatex(entry.latex, entry.options);
      const meant = readPlain(entry.plain, entry.options);
      expect(sameValue(read, meant)).toBe(true);
    });

    it("survives toLatex then readLatex unchanged", () => {
      const read = readLatex(entry.latex, entry.options);
      const printed = toLatex(read);
      expect(same(readLatex(printed, entry.options), read), printed).toBe(true);
    });

    it("survives toPlain then readPlain unchanged", () => {
      const read = readLatex(entry.latex, entry.options);
      const printed = toPlain(read);
      expect(same(readPlain(printed, entry.options), read), printed).toBe(true);
    });
  });
});

describe("readLatex names", () => {
  it("reads an undeclared GM as G times M and a declared one as one symbol", () => {
    expect(readLatexExpr("GM")).toEqual(mul(sym("G"), sym("M")));
    expect(readLatexExpr("GM", { symbols: ["GM"] })).toEqual(sym("GM"));
  });

  it("reads subscripted symbols as one symbol, however the subscript is written", () => {
    for (const s of ["r_s", "r_{s}", "r_{\\rm s}", "r_{\\mathrm{s}}", "r_\\text{s}"]) expect(readLatexExpr(s)).toEqual(sym("r_s"));
    expect(readLatexExpr("g_{tt}")).toEqual(sym("g_tt"));
    expect(readLatexExpr("g_{\\theta\\theta}")).toEqual(sym("g_thetatheta"));
    expect(readLatexExpr("M_\\odot")).toEqual(sym("M_odot"));
    expect(readLatexExpr("r_+")).toEqual(sym("r_plus"));
  });

  it("reads an undeclared letter run letter by letter, and a declared one whole", () => {
    expect(readLatexExpr("rs")).toEqual(mul(sym("r"), sym("s")));
    expect(readLatexExpr("rs", { symbols: ["rs"] })).toEqual(sym("rs"));
    expect(readLatexExpr("GM_\\odot")).toEqual(mul(sym("G"), sym("M_odot")));
  });

  it("keeps varphi and phi apart", () => {
    expect(readLatexExpr("\\varphi - \\phi")).toEqual(add(sym("varphi"), neg(sym("phi"))));
  });

  it("reads e as Euler's number unless e is declared", () => {
    expect(readLatexExpr("e^{-r}")).toEqual(pow(euler, neg(sym("r"))));
    expect(readLatexExpr("e^{-r}", { symbols: ["e"] })).toEqual(pow(sym("e"), neg(sym("r"))));
    expect(readLatexExpr("\\mathrm{e}", { symbols: ["e"] })).toEqual(euler);
  });

  it("reads pi and infinity as constants", () => {
    expect(readLatexExpr("\\pi")).toEqual(pi);
    expect(readLatexExpr("\\infty")).toEqual(infinity);
  });

  it("reads a declared function before a parenthesis as a call, an undeclared letter as a factor", () => {
    expect(readLatexExpr("A(r)", { functions: ["A"] })).toEqual(call("A", sym("r")));
    expect(readLatexExpr("A\\left(r\\right)", { functions: ["A"] })).toEqual(call("A", sym("r")));
    expect(readLatexExpr("A(r)")).toEqual(mul(sym("A"), sym("r")));
    expect(readLatexExpr("A'(r)", { functions: ["A"] })).toEqual(deriv(call("A", sym("r")), "r"));
    expect(readLatexExpr("B(r, \\theta)", { functions: ["B"] })).toEqual(call("B", sym("r"), sym("theta")));
  });

  it("normalises declared names given as LaTeX", () => {
    expect(readLatexExpr("\\Lambda r^2", { symbols: ["\\Lambda"] })).toEqual(mul(sym("Lambda"), pow(sym("r"), num(2))));
    expect(readLatexExpr("V_{\\rm eff}(r)", { functions: ["V_{\\mathrm{eff}}"] })).toEqual(call("V_eff", sym("r")));
  });

  it("reads \\mathrm{GM} as one upright name", () => {
    expect(readLatexExpr("\\mathrm{GM}")).toEqual(sym("GM"));
  });
});

describe("readLatex functions", () => {
  it("reads \\sin^2\\theta and \\sin^{2}(\\theta) as (sin θ)^2", () => {
    const expected = pow(call("sin", sym("theta")), num(2));
    expect(readLatexExpr("\\sin^2\\theta")).toEqual(expected);
    expect(readLatexExpr("\\sin^{2}(\\theta)")).toEqual(expected);
    expect(readLatexExpr("\\sin^{2}\\left(\\theta\\right)")).toEqual(expected);
  });

  it("ends a bare argument at a thin space, a dot, a differential or another function", () => {
    expect(readLatexExpr("\\sin\\theta\\,r")).toEqual(mul(call("sin", sym("theta")), sym("r")));
    expect(readLatexExpr("\\sin\\theta\\cos\\phi")).toEqual(mul(call("sin", sym("theta")), call("cos", sym("phi"))));
    expect(readLatexExpr("r^2\\sin^2\\theta\\dot\\phi^2")).toEqual(
      mul(pow(sym("r"), num(2)), pow(call("sin", sym("theta")), num(2)), pow(dot("phi"), num(2))),
    );
    expect(readLatexExpr("\\sin 2\\theta")).toEqual(call("sin", mul(num(2), sym("theta"))));
  });

  it("reads \\sin^{-1} as arcsin, \\ln and \\log as the natural logarithm", () => {
    expect(readLatexExpr("\\sin^{-1} x")).toEqual(call("asin", sym("x")));
    expect(readLatexExpr("\\ln r")).toEqual(call("log", sym("r")));
    expect(readLatexExpr("\\log r")).toEqual(call("log", sym("r")));
    expect(readLatexExpr("\\exp(-x)")).toEqual(call("exp", neg(sym("x"))));
  });

  it("reads square roots and n-th roots", () => {
    expect(readLatexExpr("\\sqrt{1-x}")).toEqual(call("sqrt", add(num(1), neg(sym("x")))));
    expect(readLatexExpr("\\sqrt x")).toEqual(call("sqrt", sym("x")));
    expect(readLatexExpr("\\sqrt[3]{x}")).toEqual(pow(sym("x"), div(num(1), num(3))));
    expect(readLatexExpr("\\sqrt[2]{x}")).toEqual(call("sqrt", sym("x")));
  });

  it("reads absolute values", () => {
    expect(readLatexExpr("|x|")).toEqual(call("abs", sym("x")));
    expect(readLatexExpr("\\left|x - 1\\right|")).toEqual(call("abs", add(sym("x"), neg(num(1)))));
  });
});

describe("readLatex products and fractions", () => {
  it("binds juxtaposition tighter than a solidus", () => {
    expect(readLatexExpr("GM/rc^2")).toEqual(div(mul(sym("G"), sym("M")), mul(sym("r"), pow(sym("c"), num(2)))));
    expect(readLatexExpr("a/b \\cdot c")).toEqual(mul(div(sym("a"), sym("b")), sym("c")));
  });

  it("reads \\frac with single-token arguments", () => {
    expect(readLatexExpr("\\frac12 x")).toEqual(mul(div(num(1), num(2)), sym("x")));
    expect(readLatexExpr("\\frac1r")).toEqual(div(num(1), sym("r")));
  });

  it("reads powers right to left through braces and keeps -x^2 as -(x^2)", () => {
    expect(readLatexExpr("x^{y^{z}}")).toEqual(pow(sym("x"), pow(sym("y"), sym("z"))));
    expect(readLatexExpr("-x^2")).toEqual(neg(pow(sym("x"), num(2))));
    expect(readLatexExpr("x^23")).toEqual(mul(pow(sym("x"), num(2)), num(3)));
  });

  it("folds scientific notation into one literal", () => {
    expect(readLatexExpr("6.674\\times10^{-11}")).toEqual(num("6.674e-11"));
    expect(readLatexExpr("3 \\cdot 10^8")).toEqual(num("3e8"));
    expect(readLatexExpr("10^{-11}")).toEqual(pow(num(10), neg(num(11))));
  });

  it("reads a\\cdot -b and a \\times b", () => {
    expect(readLatexExpr("a \\cdot -b")).toEqual(mul(sym("a"), neg(sym("b"))));
    expect(readLatexExpr("a \\times b")).toEqual(mul(sym("a"), sym("b")));
  });
});

describe("readLatex derivatives, differentials and limits", () => {
  it("reads dotted symbols", () => {
    expect(readLatexExpr("\\dot r")).toEqual(dot("r"));
    expect(readLatexExpr("\\dot{\\phi}")).toEqual(dot("phi"));
    expect(readLatexExpr("\\ddot r")).toEqual(dot("r", 2));
    expect(readLatexExpr("\\dot{r}^2")).toEqual(pow(dot("r"), num(2)));
  });

  it("reads dr/dτ as a dot only when τ is the curve parameter", () => {
    expect(readLatexExpr("\\frac{dr}{d\\tau}")).toEqual(dot("r"));
    expect(readLatexExpr("\\frac{dr}{d\\lambda}")).toEqual(deriv(sym("r"), "lambda"));
    expect(readLatexExpr("\\frac{dr}{d\\lambda}", { parameter: "\\lambda" })).toEqual(dot("r"));
    expect(readLatexExpr("\\frac{d^2 r}{d\\tau^2}")).toEqual(dot("r", 2));
    expect(readLatexExpr("\\frac{d\\dot r}{d\\tau}")).toEqual(dot("r", 2));
    expect(readLatexExpr("\\frac{\\mathrm{d}r}{\\mathrm{d}\\tau}")).toEqual(dot("r"));
  });

  it("reads operator-form and partial derivatives", () => {
    expect(readLatexExpr("\\frac{d}{dr}\\left(\\frac{1}{r}\\right)")).toEqual(deriv(div(num(1), sym("r")), "r"));
    expect(readLatexExpr("\\frac{\\partial}{\\partial r} f")).toEqual(deriv(sym("f"), "r", 1, true));
    expect(readLatexExpr("\\frac{\\partial f}{\\partial r}")).toEqual(deriv(sym("f"), "r", 1, true));
    expect(readLatexExpr("\\frac{\\partial L}{\\partial \\dot{r}}")).toEqual(deriv(sym("L"), dotVariable("r", 1), 1, true));
  });

  it("reads index-style partials \\partial_r f", () => {
    expect(readLatexExpr("\\partial_r f")).toEqual(deriv(sym("f"), "r", 1, true));
    expect(readLatexExpr("\\partial_{\\theta}\\partial_r g_{tt}")).toEqual(deriv(deriv(sym("g_tt"), "r", 1, true), "theta", 1, true));
    expect(() => readLatexExpr("\\partial f")).toThrow(ReadError);
  });

  it("reads d as a differential in a line element, as a factor elsewhere, and always after \\mathrm", () => {
    expect(readLatex("ds^2 = dt^2")).toEqual(relation(pow(differential("s"), num(2)), "=", pow(differential("t"), num(2))));
    expect(readLatexExpr("dt^2")).toEqual(mul(sym("d"), pow(sym("t"), num(2))));
    expect(readLatexExpr("dt^2", { coordinates: ["t"] })).toEqual(pow(differential("t"), num(2)));
    expect(readLatexExpr("\\mathrm{d}t")).toEqual(differential("t"));
    expect(readLatexExpr("{\\rm d}t")).toEqual(differential("t"));
    expect(readLatexExpr("d\\tau", { coordinates: ["\\tau"] })).toEqual(differential("tau"));
  });

  it("reads \\lim_{c\\to\\infty} over the product that follows", () => {
    expect(readLatexExpr("\\lim_{c\\to\\infty} \\frac{1}{c} + 1")).toEqual(add(limit(div(num(1), sym("c")), "c", infinity), num(1)));
    expect(readLatexExpr("\\lim_{Q \\rightarrow 0} Q r")).toEqual(limit(mul(sym("Q"), sym("r")), "Q", num(0)));
  });
});

describe("readLatex on pasted Unicode", () => {
  it("reads Greek letters, the typographic minus and relation signs as their commands", () => {
    expect(readLatex("r ≥ 3M")).toEqual(readLatex("r \\ge 3M"));
    expect(readLatexExpr("1 − 2M/r")).toEqual(readLatexExpr("1 - 2M/r"));
    expect(readLatexExpr("sin θ".replace("sin", "\\sin"))).toEqual(readLatexExpr("\\sin\\theta"));
    expect(readLatexExpr("Λ r² ".replace("²", "^2"))).toEqual(readLatexExpr("\\Lambda r^2"));
    expect(readLatexExpr("2π r")).toEqual(readLatexExpr("2\\pi r"));
  });
});

describe("readLatex relations and punctuation", () => {
  it("reads each relation sign", () => {
    const cases: [string, string][] = [["a = b", "="], ["a < b", "<"], ["a > b", ">"], ["a \\le b", "<="], ["a \\leq b", "<="], ["a \\ge b", ">="], ["a \\geq b", ">="], ["a \\neq b", "!="], ["a \\ne b", "!="]];
    for (const [src, op] of cases) expect((readLatex(src) as { op: string }).op, src).toBe(op);
  });

  it("ignores a trailing comma or full stop, spacing and \\displaystyle", () => {
    expect(readLatex("E = mc^2,")).toEqual(readLatex("E = mc^2"));
    expect(readLatex("E = mc^2 .")).toEqual(readLatex("E = mc^2"));
    expect(readLatex("\\displaystyle E = m\\,c^2\\;")).toEqual(readLatex("E = mc^2"));
    expect(readLatex("E &= mc^2")).toEqual(readLatex("E = mc^2"));
  });

  it("rejects an equation chain", () => {
    expect(() => readLatex("a = b = c")).toThrow(ReadError);
  });

  it("gives the same tree as the plain reader for the same meaning", () => {
    expect(exprEquals(readLatexExpr("\\left(1-\\frac{r_s}{r}\\right)c^2"), readPlain("(1-r_s/r)*c^2") as never)).toBe(true);
  });
});
