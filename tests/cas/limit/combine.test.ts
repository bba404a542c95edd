import { describe, expect, it } from "vitest";
import { combineEstimates, fateOf, scaleLatex } from "../../../cas/limit/combine";
import { additiveTerms } from "../../../cas/limit/report";
import { decimalContext } from "../../../cas/numeric/evaluate";
import { readLatex } from "../../../cas/parse/latex";
import { toLatex } from "../../../cas/print/latex";
import type { Expr } from "../../../cas/expr/types";

const D = decimalContext(80);
const like = (p: number) => scaleLatex("c", { kind: "infinity" }, p);

describe("additiveTerms", () => {
  it("splits a sum and distributes a minus over a bracketed sum (common algebra, no source)", () => {
    const terms = additiveTerms(readLatex("-\\left(1 - \\frac{2M}{r} + \\frac{Q^2}{r^2}\\right) + x") as Expr).map((t) => toLatex(t));
    expect(terms).toEqual(["-1", "\\frac{2 M}{r}", "-\\frac{Q^{2}}{r^{2}}", "x"]);
    expect(additiveTerms(readLatex("\\left(1-\\frac{r_s}{r}\\right)c^2") as Expr)).toHaveLength(1);
  });
});

describe("scaleLatex", () => {
  it("writes the scale as a power of the parameter or of its distance to the target", () => {
    expect(like(-2)).toBe("c^{-2}");
    expect(scaleLatex("Q", { kind: "value", value: "0" }, 2)).toBe("Q^{2}");
    expect(scaleLatex("r", { kind: "value", value: "2" }, -1)).toBe("(r - 2)^{-1}");
    expect(scaleLatex("x", { kind: "value", value: "-1" }, 0.5)).toBe("(x + 1)^{0.5}");
  });
});

describe("combineEstimates", () => {
  it("agrees over points, or says the behaviour differs between them", () => {
    expect(combineEstimates(D, [{ kind: "vanishes", power: -2 }, { kind: "vanishes", power: -2 }], false, like)).toEqual({ kind: "vanishes", power: -2, like: "c^{-2}" });
    expect(combineEstimates(D, [{ kind: "converges", value: new D(2) }, { kind: "converges", value: new D(3) }], true, like)).toEqual({ kind: "converges", value: "2", constant: false, free: true });
    const mixed = combineEstimates(D, [{ kind: "converges", value: new D(2) }, { kind: "vanishes", power: -1 }], false, like);
    expect(mixed).toEqual({ kind: "unclear", reason: "it behaves differently at different sample points: stays finite at some, vanishes at others" });
    expect(combineEstimates(D, [], false, like).kind).toBe("unclear");
  });

  it("counts a limit of 0 as a vanishing term", () => {
    const zero = combineEstimates(D, [{ kind: "converges", value: new D(0) }], false, like);
    expect(zero).toEqual({ kind: "converges", value: "0", constant: true, free: false });
    expect(fateOf(zero)).toBe("vanishes");
    expect(fateOf({ kind: "diverges", power: 2, like: "c^{2}" })).toBe("diverges");
  });
});
