import { describe, expect, it } from "vitest";
import { checkStep } from "../../../cas/check/check";
import { CasRequestError } from "../../../cas/check/errors";
import { STEP_CORPUS } from "./step-corpus";

describe("checkStep on the step corpus (sources named per step in step-corpus.ts)", () => {
  it("has at least 40 steps, with correct and broken versions", () => {
    expect(STEP_CORPUS.length).toBeGreaterThanOrEqual(40);
    expect(STEP_CORPUS.filter((s) => s.expected === "refuted").length).toBeGreaterThanOrEqual(15);
    expect(new Set(STEP_CORPUS.map((s) => s.id)).size).toBe(STEP_CORPUS.length);
  });

  for (const s of STEP_CORPUS) {
    it(`${s.id}: ${s.note} → ${s.expected} (${s.source})`, () => {
      const answer = checkStep(s.request);
      expect(answer.verdict, JSON.stringify(answer)).toBe(s.expected);
      if (answer.verdict === "refuted" && answer.method.kind === "numeric") {
        expect(answer.witness && Object.keys(answer.witness).length).toBeGreaterThan(0);
        for (const v of Object.values(answer.witness ?? {})) expect(v).toMatch(/^-?\d/);
      }
      // A correct step of the corpus is dimensionally sound (or not fully declared, e.g. A(r)).
      if (s.expected === "verified") expect(answer.dimensions?.status ?? "consistent").not.toBe("inconsistent");
      if (answer.verdict === "verified" && answer.method.kind === "numeric") {
        expect(answer.method.points).toBeGreaterThanOrEqual(8);
        expect(answer.method.detail).toMatch(/probabilistic|formal/);
      }
    });
  }
});

describe("checkStep answers", () => {
  it("is reproducible: the same request gives the same answer", () => {
    const req = STEP_CORPUS.find((s) => s.id === "per-tau-sign")!.request;
    expect(checkStep(req)).toEqual(checkStep(req));
  });

  it("a refuted witness replays: the two sides really differ there (common practice, no source)", () => {
    const answer = checkStep({ context: {}, from: "(a+b)^2", to: "a^2+ab+b^2" });
    expect(answer.verdict).toBe("refuted");
    const a = Number(answer.witness!.a);
    const b = Number(answer.witness!.b);
    expect((a + b) ** 2).not.toBeCloseTo(a * a + a * b + b * b, 6);
    expect(Number(answer.witnessSides!.left)).toBeCloseTo((a + b) ** 2, 8);
  });

  it("says undecided, with the reason, when the assumptions leave no sample point", () => {
    const answer = checkStep({ context: { symbols: { r: "length", r_s: "length" }, assumptions: ["r > r_s", "r < r_s"] }, from: "r", to: "r" });
    expect(answer.verdict).toBe("undecided");
    expect(answer.reason).toMatch(/no sample point/);
  });

  it("says undecided when evaluation fails everywhere", () => {
    const answer = checkStep({ context: { assumptions: ["x > 0"] }, from: "\\sqrt{-x}", to: "\\sqrt{-x}" });
    expect(answer.verdict).toBe("undecided");
    expect(answer.reason).toMatch(/square root|evaluation/);
  });

  it("refuses unreadable LaTeX with the field and position", () => {
    expect(() => checkStep({ context: {}, from: "x", to: "\\frac{1}{" })).toThrow(CasRequestError);
    try {
      checkStep({ context: {}, from: "x", to: "\\left(1-x" });
    } catch (err) {
      expect((err as CasRequestError).field).toBe("to");
      expect((err as CasRequestError).position).toBeTypeOf("number");
    }
  });

  it("adds the dimension audit when dimensions are declared, pointing at the odd term", () => {
    const answer = checkStep({ context: { symbols: { E: "energy", "\\mu": "mass", r: "length" } }, from: "E", to: "\\mu c^2 + \\mu r" });
    expect(answer.dimensions?.consistent).toBe(false);
    expect(answer.dimensions?.odd).toBe(1);
  });

  it("accepts the plain calculator syntax", () => {
    expect(checkStep({ context: {}, syntax: "plain", from: "(1-r_s/r)*c^2", to: "c^2 - r_s*c^2/r" }).verdict).toBe("verified");
  });

  it("reads a limit written into the previous step", () => {
    const answer = checkStep({ context: {}, from: "\\lim_{c\\to\\infty} \\frac{GML^2}{\\mu c^2 r^3}", to: "0" });
    expect(answer.verdict).toBe("verified");
    expect(answer.method.kind === "numeric" && answer.method.detail).toMatch(/formal/);
  });

  it("refutes a circular chain of definitions only through the definition justification", () => {
    const answer = checkStep({ context: { definitions: ["A = 2B"] }, from: "", to: "B = A + 1", justification: { kind: "definition" } });
    expect(answer.verdict).toBe("refuted");
    expect(answer.reason).toMatch(/circular/);
  });
});

describe("partial derivatives by a dotted coordinate", () => {
  it("verifies ∂L/∂ṙ of the radial kinetic term and the momentum's τ-derivative (Carroll (2004) ch. 5)", () => {
    const context = { symbols: { r: "length", r_s: "length" }, assumptions: ["r > r_s"] };
    const L = "\\frac{\\dot r^2}{1-\\frac{r_s}{r}}";
    expect(checkStep({ context, from: "", to: `\\frac{\\partial}{\\partial \\dot r}\\left(${L}\\right) = \\frac{2\\dot r}{1-\\frac{r_s}{r}}` }).verdict).toBe("verified");
    expect(checkStep({ context, from: "", to: `\\frac{d}{d\\tau}\\frac{\\partial}{\\partial \\dot r}\\left(${L}\\right) = \\frac{2\\ddot r}{1-\\frac{r_s}{r}} - \\frac{2 r_s\\dot r^2}{r^2\\left(1-\\frac{r_s}{r}\\right)^2}` }).verdict).toBe("verified");
    expect(checkStep({ context, from: "", to: `\\frac{\\partial}{\\partial \\dot r}\\left(${L}\\right) = \\frac{\\dot r}{1-\\frac{r_s}{r}}` }).verdict).toBe("refuted");
  });
});

describe("inequalities between steps", () => {
  const context = { symbols: { G: null, M: null, r: null } };
  it("r > 3GM/c² gives r > 2GM/c² but not the converse (ISCO/photon-sphere ordering, Hartle (2003) ch. 9)", () => {
    expect(checkStep({ context, from: "r > \\frac{3GM}{c^2}", to: "r > \\frac{2GM}{c^2}" }).verdict).toBe("verified");
    // Regression: points drawn only far from the bound once let the converse pass.
    expect(checkStep({ context, from: "r > \\frac{2GM}{c^2}", to: "r > \\frac{3GM}{c^2}" }).verdict).toBe("refuted");
  });
});
