import { describe, expect, it } from "vitest";
import { probeLimit } from "../../../cas/limit/probe";
import { decimalContext } from "../../../cas/numeric/evaluate";

const D = decimalContext(80);

describe("probeLimit", () => {
  it("finds the Newtonian limit c²(√(1 + 2x/c²) − 1) → x (binomial expansion, common practice)", () => {
    const x = new D("1.25");
    const out = probeLimit(D, (c) => c.pow(2).times(D.sqrt(new D(1).plus(x.times(2).div(c.pow(2)))).minus(1)), { kind: "infinity" });
    expect(out.kind).toBe("converges");
    if (out.kind === "converges") expect(out.value.toNumber()).toBeCloseTo(1.25, 9);
  });

  it("sees a 1/c² term vanish with power −2 and c² diverge", () => {
    const vanish = probeLimit(D, (c) => new D(3).div(c.pow(2)), { kind: "infinity" });
    expect(vanish).toEqual({ kind: "vanishes", power: -2 });
    expect(probeLimit(D, (c) => c.pow(2), { kind: "infinity" }).kind).toBe("diverges");
  });

  it("is unclear for an oscillation", () => {
    expect(probeLimit(D, (c) => c.sin(), { kind: "infinity" }).kind).toBe("unclear");
  });

  it("approaches a finite value from above: sin(Q)/Q → 1 as Q → 0", () => {
    const out = probeLimit(D, (q) => q.sin().div(q), { kind: "value", value: "0" });
    expect(out.kind === "converges" && out.value.toNumber()).toBeCloseTo(1, 12);
  });
});
