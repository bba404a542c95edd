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

describe("checkStep on relations as the demo notebooks write them", () => {
  // Bugs covered: correct Euler–Lagrange steps refuted (rounding inside a product; f not expanded),
  // substitution steps undecided ("share all their variables"), limits of defined symbols refuted.
  const symbols = { t: "time", r: "length", "\\theta": "dimensionless", "\\phi": "dimensionless", G: "M^-1 L^3 T^-2", M: "mass", c: "velocity", "\\mu": "mass", r_s: "length", L: "M L^2 T^-1", "\\tau": "time" };
  const f = "1 - \\frac{r_s}{r}";
  const context = { symbols, definitions: ["r_s = \\frac{2GM}{c^2}", `f = ${f}`], assumptions: ["r > r_s"], parameter: "\\tau" };
  const lagrangian = "L_{\\rm g} = \\frac{\\mu}{2}\\left(-f c^2\\dot t^2 + f^{-1}\\dot r^2 + r^2\\dot\\phi^2\\right)";

  it("Euler–Lagrange in t of a Lagrangian written with a defined f (Hartle (2003) eq. 9.17)", () => {
    const el = { kind: "euler-lagrange" as const, coordinate: "t", parameter: "\\tau" };
    expect(checkStep({ context, from: lagrangian, to: "\\frac{d}{d\\tau}\\left(\\mu f c^2\\dot t\\right) = 0", justification: el }).verdict).toBe("verified");
    expect(checkStep({ context, from: lagrangian, to: "\\frac{d}{d\\tau}\\left(\\mu c^2\\dot t\\right) = 0", justification: el }).verdict).toBe("refuted");
  });

  it("substitutes ds^2 = -c^2 dτ^2 into a line element (Hartle (2003) eq. 9.21)", () => {
    const from = `ds^2 = -\\left(${f}\\right)c^2\\,dt^2 + \\left(${f}\\right)^{-1}dr^2 + r^2\\,d\\phi^2`;
    const justification = { kind: "substitute" as const, relations: ["ds^2 = -c^2\\,d\\tau^2"] };
    expect(checkStep({ context, from, to: "-f c^2\\dot t^2 + f^{-1}\\dot r^2 + r^2\\dot\\phi^2 = -c^2", justification }).verdict).toBe("verified");
    expect(checkStep({ context, from, to: "-f c^2\\dot t^2 + f\\dot r^2 + r^2\\dot\\phi^2 = -c^2", justification }).verdict).toBe("refuted");
  });

  it("substitutes a definition that is also in the context, and dV/dr = 0 into dV/dr = … (Hartle (2003) eq. 9.46)", () => {
    const withV = { ...context, definitions: [...context.definitions, "V = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3}"] };
    const twice = { kind: "substitute" as const, relations: ["r_s = \\frac{2GM}{c^2}"] };
    expect(checkStep({ context, from: "L^2 = \\frac{GM\\mu^2 r^2}{r - \\frac{3GM}{c^2}}", to: "L^2 = \\frac{\\mu^2 c^2 r_s r^2}{2r - 3r_s}", justification: twice }).verdict).toBe("verified");
    const from = "\\frac{dV}{dr} = \\frac{GM\\mu}{r^2} - \\frac{L^2}{\\mu r^3} + \\frac{3GML^2}{\\mu c^2 r^4}";
    const circular = { kind: "substitute" as const, relations: ["\\frac{dV}{dr} = 0"] };
    expect(checkStep({ context: withV, from, to: "GM\\mu^2 r^2 - L^2 r + \\frac{3GML^2}{c^2} = 0", justification: circular }).verdict).toBe("verified");
    expect(checkStep({ context: withV, from, to: "GM\\mu^2 r^2 - L^2 r + \\frac{2GML^2}{c^2} = 0", justification: circular }).verdict).toBe("refuted");
  });

  it("reads d(L^2)/dr after L^2 = F(r) as F'(r) (SymPy: diff of μ²c²r_s r²/(2r − 3r_s))", () => {
    const from = "L^2 = \\frac{\\mu^2 c^2 r_s r^2}{2r - 3r_s}";
    const by = { kind: "differentiate" as const, by: "r" };
    const right = "\\frac{d(L^2)}{dr} = \\frac{2\\mu^2 c^2 r_s r\\left(r - 3r_s\\right)}{\\left(2r - 3r_s\\right)^2}";
    expect(checkStep({ context, from, to: right, justification: by }).verdict).toBe("verified");
    expect(checkStep({ context, from, to: right.replace("r - 3r_s\\right)}", "r - 2r_s\\right)}"), justification: by }).verdict).toBe("refuted");
  });

  it("takes a limit in a symbol the context defines (Carroll (2004) §6.4: r_Q → 0 gives Schwarzschild)", () => {
    const charged = { ...context, symbols: { ...symbols, q: "dimensionless", r_Q: "length" }, definitions: [...context.definitions, "r_Q = \\frac{qGM}{c^2}", "r_{\\rm ph} = \\frac{3r_s}{4} + \\sqrt{\\frac{9r_s^2}{16} - 2r_Q^2}"] };
    const limit = { kind: "limit" as const, symbol: "r_Q", to: "0" };
    const from = "r_{\\rm ph} = \\frac{3r_s}{4} + \\sqrt{\\frac{9r_s^2}{16} - 2r_Q^2}";
    expect(checkStep({ context: charged, from, to: "r_{\\rm ph} = \\frac{3r_s}{2}", justification: limit }).verdict).toBe("verified");
    expect(checkStep({ context: charged, from, to: "r_{\\rm ph} = 2r_s", justification: limit }).verdict).toBe("refuted");
  });

  it("gives L^2 = 0 at the static radius, where the premise cancels to rounding (from memory: r_stat³ = 3GM/(Λc²))", () => {
    const sds = { ...context, symbols: { ...symbols, "\\Lambda": "L^-2" }, assumptions: ["\\Lambda > 0"], definitions: ["r_{\\rm stat} = \\left(\\frac{3GM}{\\Lambda c^2}\\right)^{1/3}"] };
    const from = "L^2 = \\frac{\\mu^2 r^2\\left(GM - \\frac{\\Lambda c^2 r^3}{3}\\right)}{r - \\frac{3GM}{c^2}}";
    const at = { kind: "substitute" as const, relations: ["r = r_{\\rm stat}"] };
    expect(checkStep({ context: sds, from, to: "L^2 = 0", justification: at }).verdict).toBe("verified");
    expect(checkStep({ context: sds, from: from.replace("{3}\\right)", "{2}\\right)"), to: "L^2 = 0", justification: at }).verdict).toBe("refuted");
  });
});
