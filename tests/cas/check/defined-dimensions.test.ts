import { describe, expect, it } from "vitest";
import { withDefinedDimensions } from "../../../cas/check/defined-dimensions";
import { parseDimension, formatDimension } from "../../../cas/dims/dimension";
import { readPlain } from "../../../cas/parse/plain";
import type { Relation } from "../../../cas/expr/types";

const env = {
  symbols: new Map([["r", parseDimension("length")], ["r_s", parseDimension("length")], ["mu", parseDimension("mass")], ["L", parseDimension("M L^2 T^-1")], ["k", parseDimension("time")]]),
  parameter: "tau",
};
const rel = (s: string) => readPlain(s) as Relation;
const shown = (name: string, defs: string[]) => {
  const d = withDefinedDimensions(env, defs.map(rel)).symbols.get(name);
  return d ? formatDimension(d) : d;
};

describe("withDefinedDimensions (dimensions as in Hartle, Gravity (2003) ch. 9: V_eff is an energy, f is dimensionless)", () => {
  it("gives a defined symbol the dimension of its right-hand side, through chains of definitions", () => {
    expect(shown("f", ["f = 1 - r_s/r"])).toBe(formatDimension(parseDimension("dimensionless")));
    expect(shown("V", ["V = L^2*f/(2*mu*r^2)", "f = 1 - r_s/r"])).toBe(formatDimension(parseDimension("energy")));
    expect(shown("r_ISCO", ["r_ISCO = 3*r_s"])).toBe(formatDimension(parseDimension("length")));
  });

  it("never overrides a declared dimension and leaves what it cannot infer unknown", () => {
    expect(shown("k", ["k = 3*r_s"])).toBe(formatDimension(parseDimension("time")));
    expect(shown("w", ["w = z*r"])).toBeUndefined();
  });
});
