import { describe, expect, it } from "vitest";
import { normaliseName, ReadError } from "@/cas/parse";
import { resolveOptions } from "@/cas/parse/options";

describe("normaliseName", () => {
  it.each([
    ["r_s", "r_s"],
    ["r_{s}", "r_s"],
    ["\\Lambda", "Lambda"],
    ["M_\\odot", "M_odot"],
    ["V_{\\rm eff}", "V_eff"],
    ["V_{\\mathrm{eff}}", "V_eff"],
    ["g_{\\theta\\theta}", "g_thetatheta"],
    ["r_{+}", "r_plus"],
    ["GM", "GM"],
    [" \\theta ", "theta"],
  ])("%s → %s", (given, plain) => {
    expect(normaliseName(given)).toBe(plain);
  });

  it("rejects what is not a name", () => {
    for (const bad of ["", "1r", "a+b", "\\frac{1}{2}x", "r^2"]) expect(() => normaliseName(bad), bad).toThrow(ReadError);
  });
});

describe("resolveOptions", () => {
  it("puts every declared kind of name in one set and defaults the parameter to tau", () => {
    const o = resolveOptions({ symbols: ["r_{s}"], functions: ["A"], coordinates: ["\\phi"] });
    expect([...o.declared].sort()).toEqual(["A", "phi", "r_s"]);
    expect(o.parameter).toBe("tau");
    expect(resolveOptions({ parameter: "\\lambda" }).parameter).toBe("lambda");
  });
});
