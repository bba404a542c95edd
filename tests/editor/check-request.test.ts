import { describe, expect, it } from "vitest";
import { blockContext, planAllChecks, planStepCheck, toProtocolJustification } from "@/editor/check-request";
import { extractDerivation } from "@/editor/derivation";
import { doc, step } from "./support/headless";

const schwarzschild = {
  type: "spacetimeBlock",
  attrs: {
    id: "sb-1",
    name: "exterior",
    coordinates: [{ symbol: "t", dimension: "time" }, { symbol: "r", dimension: "length" }],
    lineElement: "ds^2 = …",
    constants: [{ symbol: "r_s", dimension: "length" }, { symbol: "c", dimension: "velocity" }, { symbol: "k", dimension: "" }],
    assumptions: ["r > r_s", "\\theta = \\frac{\\pi}{2}"],
    parameter: "\\tau",
  },
};

describe("toProtocolJustification", () => {
  it("maps every kind to the protocol's shape", () => {
    expect(toProtocolJustification("algebra", "", [], "\\tau")).toEqual({ kind: "algebra" });
    expect(toProtocolJustification("definition", "", [], "\\tau")).toEqual({ kind: "definition" });
    expect(toProtocolJustification("differentiate", "by r", [], "\\tau")).toEqual({ kind: "differentiate", by: "r" });
    expect(toProtocolJustification("euler-lagrange", "in \\phi", [], "\\lambda")).toEqual({ kind: "euler-lagrange", coordinate: "\\phi", parameter: "\\lambda" });
    expect(toProtocolJustification("limit", "c → ∞", [], "\\tau")).toEqual({ kind: "limit", symbol: "c", to: "\\infty" });
    expect(toProtocolJustification("limit", "Q \\to 0", [], "\\tau")).toEqual({ kind: "limit", symbol: "Q", to: "0" });
    expect(toProtocolJustification("substitute", "L = \\mu r^2\\dot\\phi; E = 1", ["x = 2"], "\\tau")).toEqual({
      kind: "substitute",
      relations: ["x = 2", "L = \\mu r^2\\dot\\phi", "E = 1"],
    });
  });

  it("says what is missing instead of sending an incomplete justification", () => {
    expect(toProtocolJustification("differentiate", " ", [], "\\tau")).toHaveProperty("problem");
    expect(toProtocolJustification("limit", "c", [], "\\tau")).toHaveProperty("problem");
    expect(toProtocolJustification("substitute", "", [], "\\tau")).toHaveProperty("problem");
  });
});

describe("blockContext", () => {
  it("declares coordinates and constants with dimensions, undeclared ones as null", () => {
    const derivation = extractDerivation(doc(schwarzschild));
    expect(blockContext(derivation.blocks[0], ["E = 1"])).toEqual({
      symbols: { t: "time", r: "length", r_s: "length", c: "velocity", k: null, "\\tau": "time", s: "length" },
      definitions: ["E = 1"],
      assumptions: ["r > r_s", "\\theta = \\frac{\\pi}{2}"],
      parameter: "\\tau",
    });
  });
});

describe("blockContext conventions", () => {
  it("leaves a declared τ and an interval that is not ds^2 alone", () => {
    const block = { ...extractDerivation(doc(schwarzschild)).blocks[0], lineElement: "d\\sigma^2 = …", constants: [{ symbol: "\\tau", dimension: "length" }] };
    const symbols = blockContext(block, []).symbols!;
    expect(symbols["\\tau"]).toBe("length");
    expect(symbols).not.toHaveProperty("s");
  });
});

describe("planStepCheck for a substitution into the line element", () => {
  // Bug: Lantern's norm condition (ds² = −c²dτ² after two Euler–Lagrange steps) was checked against the φ equation.
  const derivation = extractDerivation(
    doc(
      { ...schwarzschild, attrs: { ...schwarzschild.attrs, lineElement: "ds^2 = -c^2 dt^2 + dr^2" } },
      step("st-el", "\\frac{d}{d\\tau}\\left(r^2\\dot\\phi\\right) = 0", { kind: "euler-lagrange", detail: "\\phi" }),
      step("st-norm", "-c^2\\dot t^2 + \\dot r^2 = -c^2", { kind: "substitute", detail: "ds^2 = -c^2\\,d\\tau^2" }),
      step("st-again", "ds^2 = -c^2\\,d\\tau^2", { kind: "algebra" }),
      step("st-keep", "-c^2 = -c^2", { kind: "substitute", detail: "ds^2 = -c^2\\,d\\tau^2" }),
    ),
  );

  it("starts from the line element when the previous step has no ds^2", () => {
    const plan = planStepCheck(derivation, "st-norm");
    expect("request" in plan && plan.request.from).toBe("ds^2 = -c^2 dt^2 + dr^2");
  });

  it("keeps the previous step when it has the ds^2 being replaced", () => {
    const plan = planStepCheck(derivation, "st-keep");
    expect("request" in plan && plan.request.from).toBe("ds^2 = -c^2\\,d\\tau^2");
  });
});

describe("planStepCheck", () => {
  const derivation = extractDerivation(
    doc(
      schwarzschild,
      step("st-def", "E = \\mu c^2\\left(1-\\frac{r_s}{r}\\right)\\dot t", { kind: "definition" }),
      step("st-1", "f = \\left(1-\\frac{r_s}{r}\\right)c^2"),
      step("st-2", "f = c^2 - \\frac{r_s c^2}{r}"),
      step("st-3", "g = 1", { kind: "substitute", cites: ["st-def"], detail: "r = 2r_s" }),
      step("st-4", "h = 2", { cites: ["st-1"] }),
      step("st-5", "", {}),
    ),
  );

  it("checks a step against the previous one, in its block's context with earlier definitions", () => {
    expect(planStepCheck(derivation, "st-2")).toEqual({
      request: {
        context: {
          symbols: { t: "time", r: "length", r_s: "length", c: "velocity", k: null, "\\tau": "time", s: "length" },
          definitions: ["E = \\mu c^2\\left(1-\\frac{r_s}{r}\\right)\\dot t"],
          assumptions: ["r > r_s", "\\theta = \\frac{\\pi}{2}"],
          parameter: "\\tau",
        },
        from: "f = \\left(1-\\frac{r_s}{r}\\right)c^2",
        to: "f = c^2 - \\frac{r_s c^2}{r}",
        justification: { kind: "algebra" },
      },
    });
  });

  it("starts from the cited step when one is cited", () => {
    const plan = planStepCheck(derivation, "st-4");
    expect("request" in plan && plan.request.from).toBe("f = \\left(1-\\frac{r_s}{r}\\right)c^2");
  });

  it("substitutes the cited relations into the previous step", () => {
    const plan = planStepCheck(derivation, "st-3");
    expect("request" in plan && plan.request.from).toBe("f = c^2 - \\frac{r_s c^2}{r}");
    expect("request" in plan && plan.request.justification).toEqual({
      kind: "substitute",
      relations: ["E = \\mu c^2\\left(1-\\frac{r_s}{r}\\right)\\dot t", "r = 2r_s"],
    });
  });

  it("starts the first derived step under a block from the block's line element, skipping definitions", () => {
    const plan = planStepCheck(derivation, "st-1");
    expect("request" in plan && plan.request.from).toBe("ds^2 = …");
  });

  it("does not check an empty step, or a first step with neither a previous step nor a line element", () => {
    expect(planStepCheck(derivation, "st-5")).toHaveProperty("notChecked");
    const bare = { ...schwarzschild, attrs: { ...schwarzschild.attrs, lineElement: "" } };
    const lone = extractDerivation(doc(bare, step("st-x", "a = b")));
    expect(planStepCheck(lone, "st-x")).toHaveProperty("notChecked");
  });

  it("plans every step, keyed by id in order", () => {
    expect([...planAllChecks(derivation).keys()]).toEqual(["st-def", "st-1", "st-2", "st-3", "st-4", "st-5"]);
  });
});

describe("planStepCheck and declared constants", () => {
  it("keeps a constant of motion's definition out of the context (it is cited instead), other definitions in", () => {
    const block = { ...schwarzschild, attrs: { ...schwarzschild.attrs, constants: [...schwarzschild.attrs.constants, { symbol: "L", dimension: "M L^2 T^-1" }] } };
    const derivation = extractDerivation(
      doc(block, step("st-L", "L = \\mu r^2\\dot\\phi", { kind: "definition" }), step("st-f", "f = 1 - \\frac{r_s}{r}", { kind: "definition" }), step("st-x", "V = \\frac{L^2 f}{r^2}")),
    );
    const plan = planStepCheck(derivation, "st-x");
    expect("request" in plan && plan.request.context.definitions).toEqual(["f = 1 - \\frac{r_s}{r}"]);
    const withRs = extractDerivation(doc(block, step("st-rs", "r_s = \\frac{2GM}{c^2}", { kind: "definition" }), step("st-y", "a = b")));
    const planY = planStepCheck(withRs, "st-y");
    expect("request" in planY && planY.request.context.definitions).toEqual(["r_s = \\frac{2GM}{c^2}"]);
  });
});

describe("planStepCheck with an explicit source", () => {
  it("substitutes the cited steps into the step it follows, not the previous one", () => {
    const derivation = extractDerivation(
      doc(
        schwarzschild,
        step("st-n", "-f c^2 \\dot t^2 + \\dot r^2 = -c^2"),
        step("st-e", "\\dot t = \\frac{E}{\\mu c^2 f}", { cites: ["st-n"] }),
        step("st-s", "-\\frac{E^2}{\\mu^2 c^2 f} + \\dot r^2 = -c^2", { kind: "substitute", cites: ["st-e"], follows: "st-n" }),
      ),
    );
    const plan = planStepCheck(derivation, "st-s");
    expect("request" in plan && plan.request.from).toBe("-f c^2 \\dot t^2 + \\dot r^2 = -c^2");
    expect("request" in plan && plan.request.justification).toEqual({ kind: "substitute", relations: ["\\dot t = \\frac{E}{\\mu c^2 f}"] });
  });

  it("ignores a `follows` that points at a later or unknown step", () => {
    const derivation = extractDerivation(doc(schwarzschild, step("st-1", "a = b"), step("st-2", "a = c", { follows: "st-3" }), step("st-3", "c = d")));
    expect(derivation.steps[1].followsId).toBeNull();
    const plan = planStepCheck(derivation, "st-2");
    expect("request" in plan && plan.request.from).toBe("a = b");
  });
});
