import { describe, expect, it } from "vitest";
import { latexName } from "@/cas/print";
import { readLatexExpr } from "@/cas/parse";
import { sym } from "@/cas/expr/build";

describe("latexName", () => {
  it.each([
    ["theta", "\\theta"],
    ["r_s", "r_{s}"],
    ["g_tt", "g_{tt}"],
    ["g_thetatheta", "g_{\\theta\\theta}"],
    ["g_tphi", "g_{t\\phi}"],
    ["M_odot", "M_{\\odot}"],
    ["V_eff", "V_{\\mathrm{eff}}"],
    ["r_ISCO", "r_{\\mathrm{ISCO}}"],
    ["GM", "\\mathrm{GM}"],
    ["r_plus", "r_{+}"],
    ["omega_infty", "\\omega_{\\infty}"],
    ["a_0", "a_{0}"],
    ["x_mut", "x_{\\mu t}"],
  ])("%s → %s, and back", (name, latex) => {
    expect(latexName(name)).toBe(latex);
    expect(readLatexExpr(latex)).toEqual(sym(name));
  });

  it("never throws on a name that is not an identifier", () => {
    expect(latexName("a b+")).toBe("\\mathrm{ab}");
  });
});
