import { describe, expect, it } from "vitest";
import { defaultLimitChoice, planLimitProbe } from "@/editor/limit-probe-request";
import { extractDerivation } from "@/editor/derivation";
import { runVerb } from "@/cas/api";
import type { LimitProbeAnswer } from "@/cas/limit/protocol";
import { doc, step } from "./support/headless";

const block = {
  type: "spacetimeBlock",
  attrs: {
    id: "sb-1",
    name: "Kestrel-7 exterior",
    coordinates: [{ symbol: "t", dimension: "time" }, { symbol: "r", dimension: "length" }],
    lineElement: "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2dt^2 + \\frac{dr^2}{1-\\frac{r_s}{r}} + r^2d\\phi^2",
    constants: [{ symbol: "r_s", dimension: "length" }, { symbol: "M", dimension: "mass" }, { symbol: "\\ell", dimension: "L^2 T^-1" }],
    assumptions: ["r > r_s"],
    parameter: "\\tau",
  },
};

// V_eff per unit mass written with r_s = 2GM/c²: Hartle, Gravity (2003) §9.3 (from memory).
const notebook = doc(
  block,
  step("st-rs", "r_s = \\frac{2GM}{c^2}", { kind: "definition" }),
  step("st-v", "V = -\\frac{r_s c^2}{2r} + \\frac{\\ell^2}{2r^2} - \\frac{r_s\\ell^2}{2r^3}"),
  step("st-n", "V = -\\frac{GM}{r} + \\frac{\\ell^2}{2r^2}", { kind: "limit", detail: "c \\to \\infty" }),
  step("st-q", "x", { kind: "limit", detail: "Q → 0" }),
  step("st-empty", ""),
);

describe("defaultLimitChoice", () => {
  it("starts from the step's own limit justification, else c → ∞", () => {
    expect(defaultLimitChoice("limit", "c \\to \\infty")).toEqual({ parameter: "c", target: "infinity" });
    expect(defaultLimitChoice("limit", "Q → 0")).toEqual({ parameter: "Q", target: "0" });
    expect(defaultLimitChoice("limit", "c")).toEqual({ parameter: "c", target: "infinity" });
    expect(defaultLimitChoice("algebra", "")).toEqual({ parameter: "c", target: "infinity" });
  });
});

describe("planLimitProbe", () => {
  const derivation = extractDerivation(notebook);

  it("probes the step's own relation with the block's context and the definitions above it", () => {
    const plan = planLimitProbe(derivation, "st-v", { parameter: " c ", target: "∞" });
    if (!("request" in plan)) throw new Error(plan.notProbed);
    expect(plan.request.expression).toBe("V = -\\frac{r_s c^2}{2r} + \\frac{\\ell^2}{2r^2} - \\frac{r_s\\ell^2}{2r^3}");
    expect(plan.request.parameter).toBe("c");
    expect(plan.request.target).toBe("infinity");
    expect(plan.request.context.definitions).toEqual(["r_s = \\frac{2GM}{c^2}"]);
    expect(plan.request.context.assumptions).toEqual(["r > r_s"]);
  });

  it("gives a request the limit verb answers: the relativistic term vanishes, the Newtonian ones stay (Goldstein, Classical Mechanics (2002) §3.3)", () => {
    const plan = planLimitProbe(derivation, "st-v", { parameter: "c", target: "infinity" });
    if (!("request" in plan)) throw new Error(plan.notProbed);
    const out = runVerb("limit", plan.request);
    if (!out.ok) throw new Error(out.error.message);
    const answer = out.value as LimitProbeAnswer;
    expect(answer.sides[1].terms.map((t) => t.fate)).toEqual(["remains", "remains", "vanishes"]);
    expect(answer.vanishing).toEqual(["-\\frac{r_{s} \\ell^{2}}{2 r^{3}}"]);
  });

  it("says why a step cannot be probed", () => {
    expect(planLimitProbe(derivation, "st-empty", { parameter: "c", target: "infinity" })).toEqual({ notProbed: "The step is empty." });
    expect(planLimitProbe(derivation, "nope", { parameter: "c", target: "infinity" })).toHaveProperty("notProbed");
    expect(planLimitProbe(derivation, "st-v", { parameter: " ", target: "infinity" })).toHaveProperty("notProbed");
    expect(planLimitProbe(derivation, "st-v", { parameter: "c", target: "" })).toHaveProperty("notProbed");
  });
});
