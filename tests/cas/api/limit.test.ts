import { describe, expect, it } from "vitest";
import { runVerb } from "@/cas/api";
import type { LimitProbeAnswer } from "@/cas/limit/protocol";

function probe(input: Record<string, unknown>): LimitProbeAnswer {
  const out = runVerb("limit", { context: {}, ...input });
  if (!out.ok) throw new Error(`limit refused: ${JSON.stringify(out.error)}`);
  return out.value as LimitProbeAnswer;
}

function refusal(input: Record<string, unknown>) {
  const out = runVerb("limit", input);
  if (out.ok) throw new Error("expected a refusal");
  return out.error;
}

// Schwarzschild effective potential per unit mass with G and c written out: Hartle, Gravity (2003)
// §9.3, eqs. 9.29–9.30 in G = c = 1 units (equation numbers from memory); MTW (1973) eq. 25.16 (from memory).
const veffPerUnitMass = "-\\frac{GM}{r} + \\frac{\\ell^2}{2r^2} - \\frac{GM\\ell^2}{c^2 r^3}";
// Its Newtonian limit: Goldstein, Classical Mechanics (3rd ed., 2002) §3.3, V' = V + l²/(2mr²), per unit mass.
const newtonianPerUnitMass = "-\\frac{GM}{r} + \\frac{\\ell^2}{2r^2}";

describe("limit verb: Schwarzschild effective potential as c → ∞", () => {
  it("keeps the Newtonian terms and loses the relativistic one like c^-2", () => {
    const a = probe({ expression: veffPerUnitMass, parameter: "c", target: "infinity" });
    expect(a.kind).toBe("expression");
    const [side] = a.sides;
    expect(side.terms.map((t) => t.fate)).toEqual(["remains", "remains", "vanishes"]);
    // −GMℓ²/(c²r³) ∝ c^−2 (Hartle (2003) §9.3: the only term with c left in it)
    expect(side.terms[2].estimate).toEqual({ kind: "vanishes", power: -2, like: "c^{-2}" });
    expect(side.terms[2].formalPower).toBe(-2);
    expect(side.terms[0].estimate).toMatchObject({ kind: "converges", free: true });
    expect(a.vanishing).toEqual(["-\\frac{G M \\ell^{2}}{c^{2} r^{3}}"]);
    expect(a.remaining).toEqual(["-\\frac{G M}{r}", "\\frac{\\ell^{2}}{2 r^{2}}"]);
    // The limiting form can be written down: Goldstein (2002) §3.3 per unit mass.
    expect(side.limit).toBe("-\\frac{G M}{r} + \\frac{\\ell^{2}}{2 r^{2}}");
    expect(a.points).toBe(8);
    expect(a.digits).toBe(80);
  });

  it("tends to the Newtonian potential given as expected", () => {
    const a = probe({ expression: veffPerUnitMass, parameter: "c", target: "\\infty", expected: newtonianPerUnitMass });
    expect(a.expected).toMatchObject({ same: "yes" });
  });

  it("refutes a Newtonian potential without the ½ (ours: deliberately broken) with a witness point", () => {
    const a = probe({ expression: veffPerUnitMass, parameter: "c", target: "infinity", expected: "-\\frac{GM}{r} + \\frac{\\ell^2}{r^2}" });
    expect(a.expected?.same).toBe("no");
    expect(Object.keys(a.expected?.witness ?? {})).toEqual(expect.arrayContaining(["G", "M", "ell", "r"]));
  });

  it("with a test mass μ: the GR term −GML²/(μc²r³) vanishes, −GMμ/r and L²/(2μr²) remain (Carroll (2004) ch. 5; Goldstein (2002) §3.3)", () => {
    const a = probe({
      context: { symbols: { r: "length", M: "mass", "\\mu": "mass", L: "angular momentum", "V_{\\rm eff}": "energy" }, assumptions: ["r > 0"] },
      expression: "V_{\\rm eff} = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3}",
      parameter: "c",
      target: "infinity",
      expected: "V_{\\rm eff} = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2}",
    });
    expect(a.kind).toBe("relation");
    expect(a.vanishing).toEqual(["-\\frac{G M L^{2}}{\\mu c^{2} r^{3}}"]);
    expect(a.remaining).toEqual(["V_{\\mathrm{eff}}", "-\\frac{G M \\mu}{r}", "\\frac{L^{2}}{2 \\mu r^{2}}"]);
    expect(a.expected?.same).toBe("yes");
    // V_eff only names the right side, so the two sides are not compared with each other.
    expect(a.relation).toBeUndefined();
    expect(a.notes.join(" ")).toMatch(/only names the other side/);
  });

  it("follows r_s = 2GM/c² through the definitions (Hartle (2003) eq. 9.1 form, from memory)", () => {
    const a = probe({
      context: { definitions: ["r_s = \\frac{2GM}{c^2}"], assumptions: ["r > r_s"] },
      expression: "-\\frac{r_s c^2}{2r} + \\frac{\\ell^2}{2r^2} - \\frac{r_s \\ell^2}{2r^3}",
      parameter: "c",
      target: "infinity",
      expected: newtonianPerUnitMass,
    });
    expect(a.sides[0].terms.map((t) => t.fate)).toEqual(["remains", "remains", "vanishes"]);
    expect(a.sides[0].terms[2].estimate).toMatchObject({ kind: "vanishes", power: -2 });
    expect(a.expected?.same).toBe("yes");
  });
});

describe("limit verb: Reissner–Nordström → Schwarzschild as Q → 0", () => {
  // g_tt = −(1 − 2M/r + Q²/r²) in G = c = 1 units: Carroll, Spacetime and Geometry (2004) §6.5 (section from memory);
  // Q = 0 gives Schwarzschild's −(1 − 2M/r): Carroll (2004) §5.1 (section from memory).
  const rn = "-\\left(1 - \\frac{2M}{r} + \\frac{Q^2}{r^2}\\right)";

  it("loses the charge term like Q^2 and tends to the Schwarzschild g_tt", () => {
    const a = probe({ context: { assumptions: ["r > 2M"] }, expression: rn, parameter: "Q", target: "0", expected: "-\\left(1 - \\frac{2M}{r}\\right)" });
    expect(a.target).toBe("0");
    expect(a.sides[0].terms.map((t) => t.fate)).toEqual(["remains", "remains", "vanishes"]);
    expect(a.sides[0].terms[2].estimate).toEqual({ kind: "vanishes", power: 2, like: "Q^{2}" });
    expect(a.sides[0].terms[2]).not.toHaveProperty("formalPower");
    expect(a.expected?.same).toBe("yes");
    expect(a.sequence).toMatch(/towards 0 from above/);
  });

  it("as an equation g_tt = …, compared with the Schwarzschild equation up to rearrangement", () => {
    const a = probe({
      context: { symbols: { "g_{tt}": null }, assumptions: ["r > 2M"] },
      expression: `g_{tt} = ${rn}`,
      parameter: "Q",
      target: "0",
      expected: "1 - \\frac{2M}{r} + g_{tt} = 0",
    });
    expect(a.expected?.same).toBe("yes");
  });

  it("refutes a Schwarzschild g_tt with M in place of 2M (ours: deliberately broken)", () => {
    const a = probe({ context: { assumptions: ["r > 2M"] }, expression: rn, parameter: "Q", target: "0", expected: "-\\left(1 - \\frac{M}{r}\\right)" });
    expect(a.expected?.same).toBe("no");
    expect(a.expected?.detail).toMatch(/the expression tends to .* and the expected form to /);
  });
});

describe("limit verb: gravitational redshift factor as c → ∞", () => {
  // √(1 − 2GM/(rc²)), the rate of a static clock at r: Hartle (2003) §9.2 (section from memory).
  const factor = "\\sqrt{1 - \\frac{2GM}{rc^2}}";

  it("tends to 1 at every point", () => {
    const a = probe({ expression: factor, parameter: "c", target: "infinity", expected: "1" });
    expect(a.sides[0].estimate).toEqual({ kind: "converges", value: "1", constant: true, free: false });
    expect(a.expected?.same).toBe("yes");
  });

  it("its correction vanishes like c^-2, and c² times it tends to −GM/r (binomial expansion; Hartle (2003) §9.2 weak-field form)", () => {
    const correction = probe({ expression: `${factor} - 1`, parameter: "c", target: "infinity" });
    expect(correction.sides[0].estimate).toMatchObject({ kind: "vanishes", power: -2, like: "c^{-2}" });
    const scaled = probe({ expression: `c^2\\left(${factor} - 1\\right)`, parameter: "c", target: "infinity", expected: "-\\frac{GM}{r}" });
    expect(scaled.expected?.same).toBe("yes");
  });

  it("compares the two sides of an equation: the weak-field form holds in the limit, a factor 2 too many does not (ours)", () => {
    const good = probe({ expression: `c^2\\left(${factor} - 1\\right) = -\\frac{GM}{r}`, parameter: "c", target: "infinity" });
    expect(good.relation).toMatchObject({ same: "yes" });
    const bad = probe({ expression: `c^2\\left(${factor} - 1\\right) = -\\frac{2GM}{r}`, parameter: "c", target: "infinity" });
    expect(bad.relation?.same).toBe("no");
    expect(bad.relation?.detail).toMatch(/the left side tends to .* and the right side to /);
    expect(Object.keys(bad.relation?.witness ?? {})).toEqual(["G", "M", "r"]);
  });
});

describe("limit verb: growing sides and other targets", () => {
  it("sees the rest energy μc² diverge like c² (Einstein, Ann. Phys. 18 (1905) 639, E = mc²)", () => {
    const a = probe({ expression: "\\mu c^2 + \\frac{1}{2}\\mu v^2", parameter: "c", target: "infinity" });
    expect(a.sides[0].terms[0].estimate).toEqual({ kind: "diverges", power: 2, like: "c^{2}" });
    expect(a.sides[0].terms.map((t) => t.fate)).toEqual(["diverges", "remains"]);
    expect(a.sides[0].limit).toBeUndefined();
  });

  it("γμc² = μc² + ½μv²: both sides grow, their difference ~ 3μv⁴/(8c²) goes to 0 (Jackson, Classical Electrodynamics (3rd ed., 1999) §11.5, section from memory; binomial expansion)", () => {
    const a = probe({ expression: "\\frac{\\mu c^2}{\\sqrt{1 - \\frac{v^2}{c^2}}} = \\mu c^2 + \\frac{1}{2}\\mu v^2", parameter: "c", target: "infinity" });
    expect(a.relation?.same).toBe("yes");
    expect(a.relation?.detail).toMatch(/grow without bound/);
  });

  it("approaches a finite, non-zero value: (x² − 1)/(x − 1) → 2 as x → 1 (common algebra, no source)", () => {
    const a = probe({ expression: "\\frac{x^2-1}{x-1}", parameter: "x", target: "1", expected: "2" });
    expect(a.sides[0].estimate).toEqual({ kind: "converges", value: "2", constant: true, free: false });
    expect(a.expected?.same).toBe("yes");
    expect(a.sequence).toMatch(/1 \+ 1\.37·10\^-3/);
  });

  it("says the scale is (r − 2) for a pole at r = 2 (common algebra, no source)", () => {
    const a = probe({ expression: "\\frac{1}{r-2}", parameter: "r", target: "2" });
    expect(a.sides[0].estimate).toEqual({ kind: "diverges", power: -1, like: "(r - 2)^{-1}" });
  });

  it("is unclear for an oscillation, and says why", () => {
    const a = probe({ expression: "\\sin(c)", parameter: "c", target: "infinity" });
    expect(a.sides[0].estimate.kind).toBe("unclear");
    expect(a.sides[0].terms[0].fate).toBe("unclear");
  });

  it("notes a parameter that does not occur, and assumptions no point satisfies", () => {
    const free = probe({ expression: "\\frac{GM}{r}", parameter: "c", target: "infinity" });
    expect(free.notes.join(" ")).toMatch(/c does not occur/);
    expect(free.remaining).toEqual(["\\frac{G M}{r}"]);
    const empty = probe({ context: { assumptions: ["r > 3", "r < 2"] }, expression: "\\frac{GM}{r c^2}", parameter: "c", target: "infinity" });
    expect(empty.points).toBe(0);
    expect(empty.sides[0].estimate).toEqual({ kind: "unclear", reason: "no sample point satisfied the assumptions" });
    expect(empty.notes.join(" ")).toMatch(/Only 0 of 8/);
  });

  it("always says it is a formal estimate along a finite sequence, not a proof, and repeats itself", () => {
    const request = { expression: veffPerUnitMass, parameter: "c", target: "infinity" };
    const a = probe(request);
    expect(a.note).toMatch(/formal/);
    expect(a.note).toMatch(/finite sequence/);
    expect(a.note).toMatch(/not a proof/);
    expect(probe(request)).toEqual(a);
  });
});

describe("limit verb: bad input gets a clear refusal", () => {
  const ok = { context: {}, expression: "x", parameter: "c", target: "infinity" };

  it("points at unreadable LaTeX with its field and position, like the other verbs", () => {
    expect(refusal({ ...ok, expression: "\\frac{1}{" })).toMatchObject({ code: "unreadable", field: "expression", position: expect.any(Number) });
    expect(refusal({ ...ok, expected: "\\left(x" })).toMatchObject({ code: "unreadable", field: "expected" });
    expect(refusal({ ...ok, parameter: "\\hbox" })).toMatchObject({ code: "unreadable", field: "parameter" });
  });

  it("refuses a target that is not ∞ or a number, and −∞", () => {
    expect(refusal({ ...ok, target: "x" })).toMatchObject({ code: "malformed", field: "target" });
    expect(refusal({ ...ok, target: "-\\infty" })).toMatchObject({ code: "malformed", field: "target" });
  });

  it("refuses inequalities and an expected form of the other shape", () => {
    expect(refusal({ ...ok, expression: "r > r_s" })).toMatchObject({ code: "malformed", field: "expression" });
    expect(refusal({ ...ok, expression: "a = b", expected: "a" })).toMatchObject({ code: "malformed", field: "expected" });
    expect(refusal({ ...ok, expression: "a", expected: "a = b" })).toMatchObject({ code: "malformed", field: "expected" });
  });

  it("refuses a wrong shape, circular definitions and oversized input without crashing", () => {
    expect(refusal({ context: {}, expression: "x", target: "infinity" })).toMatchObject({ code: "malformed" });
    expect(refusal({ ...ok, extra: 1 })).toMatchObject({ code: "malformed" });
    expect(refusal({ ...ok, expression: "x".repeat(30_000) })).toMatchObject({ code: "too_large" });
    expect(refusal({ ...ok, context: { definitions: ["a = b + 1", "b = a"] }, expression: "a" })).toMatchObject({ code: "malformed", message: expect.stringMatching(/circular/) });
  });
});
