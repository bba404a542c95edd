// The step corpus: steps of the Schwarzschild orbit derivation as a group would
// write them, each correct version with deliberately broken twins. Scenario and
// notation are ours: a test body of mass \mu around a non-rotating object of
// mass M, r_s = 2GM/c^2, proper time \tau, equatorial plane.
// Sources of the relations (equation numbers from memory where given):
//   Hartle, Gravity (2003) ch. 9 — Schwarzschild line element, conserved e and ℓ,
//     radial equation with effective potential, circular orbits, photon orbits, redshift;
//   Carroll, Spacetime and Geometry (2004) ch. 5 — geodesic Lagrangian, Euler–Lagrange
//     equations, conserved E and L, V(r) with the GML²/r³ term, circular orbits;
//   Misner, Thorne & Wheeler, Gravitation (1973) ch. 25 — effective potential, orbits.
// The broken twins are ours: a sign, a factor 2, a lost c², a wrong power.
import type { CheckContext, CheckRequest } from "../../../cas/check/protocol";

export interface CorpusStep {
  readonly id: string;
  readonly note: string;
  /** Where the relation comes from ("ours" for a deliberately broken twin). */
  readonly source: string;
  readonly expected: "verified" | "refuted";
  readonly request: CheckRequest;
}

const symbols = {
  t: "time", r: "length", "\\theta": "dimensionless", "\\phi": "dimensionless", "\\tau": "time",
  r_s: "length", M: "mass", "\\mu": "mass", E: "energy", L: "angular momentum",
  "V_{\\rm eff}": "energy", a: "length", e: "dimensionless", "\\epsilon": "M^0 L^2 T^-2", "\\ell": "L^2 T^-1", "E_{N}": "energy",
} as const;

const base: CheckContext = { symbols, assumptions: ["r > r_s"], definitions: [] };
const rs = "r_s = \\frac{2GM}{c^2}";
const energy = "E = \\mu c^2\\left(1-\\frac{r_s}{r}\\right)\\dot t";
const angular = "L = \\mu r^2\\dot\\phi";
const veff = "V_{\\rm eff} = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3}";
const withDefs = (...definitions: string[]): CheckContext => ({ ...base, definitions });

const f = "\\left(1-\\frac{r_s}{r}\\right)";
const lineFull = `-c^2 d\\tau^2 = -${f}c^2\\,dt^2 + \\frac{dr^2}{1-\\frac{r_s}{r}} + r^2\\,d\\theta^2 + r^2\\sin^2\\theta\\,d\\phi^2`;
const lineEq = `-c^2 d\\tau^2 = -${f}c^2\\,dt^2 + \\frac{dr^2}{1-\\frac{r_s}{r}} + r^2\\,d\\phi^2`;
const perTau = `-c^2 = -${f}c^2\\dot t^2 + \\frac{\\dot r^2}{1-\\frac{r_s}{r}} + r^2\\dot\\phi^2`;
const multiplied = `-c^2${f} = -${f}^2c^2\\dot t^2 + \\dot r^2 + ${f}r^2\\dot\\phi^2`;
const withEL = `-c^2${f} = -\\frac{E^2}{\\mu^2c^2} + \\dot r^2 + ${f}\\frac{L^2}{\\mu^2r^2}`;
const lagrangian = `-${f}c^2\\dot t^2 + \\frac{\\dot r^2}{1-\\frac{r_s}{r}} + r^2\\dot\\phi^2`;
const generalLagrangian = "-A(r)c^2\\dot t^2 + B(r)\\dot r^2 + r^2\\dot\\phi^2";
const veffRhs = "-\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3}";

const H9 = "Hartle (2003) ch. 9";
const C5 = "Carroll (2004) ch. 5";
const MTW25 = "Misner–Thorne–Wheeler (1973) ch. 25";
const OURS = "ours: deliberately broken";

const step = (id: string, note: string, source: string, expected: "verified" | "refuted", request: CheckRequest): CorpusStep => ({ id, note, source, expected, request });

export const STEP_CORPUS: readonly CorpusStep[] = [
  // Schwarzschild radius in the metric factor.
  step("rs-in-factor", "r_s = 2GM/c^2 in 1 - r_s/r", `${H9} (Schwarzschild metric, eq. 9.1 from memory)`, "verified",
    { context: withDefs(rs), from: "1-\\frac{2GM}{c^2 r}", to: "1-\\frac{r_s}{r}" }),
  step("rs-in-factor-factor2", "lost the factor 2 of r_s", OURS, "refuted",
    { context: withDefs(rs), from: "1-\\frac{GM}{c^2 r}", to: "1-\\frac{r_s}{r}" }),
  step("inverse-factor", "(1 - r_s/r)^{-1} = r/(r - r_s)", "common algebra, no source", "verified",
    { context: base, from: `${f}^{-1}`, to: "\\frac{r}{r-r_s}" }),
  step("inverse-factor-sign", "sign slip in the denominator", OURS, "refuted",
    { context: base, from: `${f}^{-1}`, to: "\\frac{r}{r+r_s}" }),
  step("expand-factor", "(1 - r_s/r)c^2 expanded", "common algebra, no source", "verified",
    { context: base, from: `${f}c^2`, to: "c^2-\\frac{r_s c^2}{r}" }),
  step("expand-factor-lost-c2", "lost c^2 on one term", OURS, "refuted",
    { context: base, from: `${f}c^2`, to: "c^2-\\frac{r_s}{r}" }),

  // Equatorial reduction.
  step("equatorial", "θ = π/2, dθ = 0 in the line element", `${H9}; ${C5}`, "verified",
    { context: base, from: lineFull, to: lineEq, justification: { kind: "substitute", relations: ["\\theta=\\frac{\\pi}{2}", "d\\theta=0"] } }),
  step("equatorial-factor2", "a stray factor 2 on the φ term", OURS, "refuted",
    { context: base, from: lineFull, to: lineEq.replace("r^2\\,d\\phi^2", "2r^2\\,d\\phi^2"), justification: { kind: "substitute", relations: ["\\theta=\\frac{\\pi}{2}", "d\\theta=0"] } }),
  step("equatorial-lost-c2", "lost c^2 on dt^2", OURS, "refuted",
    { context: base, from: lineFull, to: lineEq.replace(`${f}c^2\\,dt^2`, `${f}\\,dt^2`), justification: { kind: "substitute", relations: ["\\theta=\\frac{\\pi}{2}", "d\\theta=0"] } }),
  step("equatorial-by-assumption", "θ = π/2 as a notebook assumption, plain algebra", `${H9}`, "verified",
    { context: { ...base, assumptions: ["r > r_s", "\\theta = \\frac{\\pi}{2}"] }, from: lineFull, to: lineEq }),

  // Dividing by dτ².
  step("per-tau", "divide the line element by dτ^2", `${H9}; ${C5}`, "verified",
    { context: base, from: lineEq, to: perTau }),
  step("per-tau-power", "wrong power of φ̇", OURS, "refuted",
    { context: base, from: lineEq, to: perTau.replace("r^2\\dot\\phi^2", "r^2\\dot\\phi") }),
  step("per-tau-sign", "sign of the ṫ term", OURS, "refuted",
    { context: base, from: lineEq, to: perTau.replace(`= -${f}c^2\\dot t^2`, `= ${f}c^2\\dot t^2`) }),

  // Multiplying through by (1 - r_s/r).
  step("multiply-through", "multiply by (1 - r_s/r)", `${H9}; ${C5}`, "verified",
    { context: base, from: perTau, to: multiplied }),
  step("multiply-through-missed-term", "the φ̇ term not multiplied", OURS, "refuted",
    { context: base, from: perTau, to: multiplied.replace(`${f}r^2\\dot\\phi^2`, "r^2\\dot\\phi^2") }),
  step("multiply-through-power", "(1 - r_s/r) instead of its square on ṫ", OURS, "refuted",
    { context: base, from: perTau, to: multiplied.replace(`-${f}^2c^2\\dot t^2`, `-${f}c^2\\dot t^2`) }),

  // Euler–Lagrange equations of the geodesic Lagrangian.
  step("el-t", "t is cyclic: d/dτ[(1 - r_s/r) ṫ] = 0", `${C5} (geodesic Lagrangian, E conserved)`, "verified",
    { context: base, from: lagrangian, to: `\\frac{d}{d\\tau}\\left[${f}\\dot t\\right] = 0`, justification: { kind: "euler-lagrange", coordinate: "t", parameter: "\\tau" } }),
  step("el-t-power", "squared factor in the conserved quantity", OURS, "refuted",
    { context: base, from: lagrangian, to: `\\frac{d}{d\\tau}\\left[${f}^2\\dot t\\right] = 0`, justification: { kind: "euler-lagrange", coordinate: "t", parameter: "\\tau" } }),
  step("el-phi", "φ is cyclic: d/dτ(r^2 φ̇) = 0", `${C5}; ${H9}`, "verified",
    { context: base, from: lagrangian, to: "\\frac{d}{d\\tau}\\left(r^2\\dot\\phi\\right) = 0", justification: { kind: "euler-lagrange", coordinate: "\\phi", parameter: "\\tau" } }),
  step("el-phi-expanded", "the same, expanded and rescaled", `${C5}`, "verified",
    { context: base, from: lagrangian, to: "2r\\dot r\\dot\\phi + r^2\\ddot\\phi = 0", justification: { kind: "euler-lagrange", coordinate: "\\phi", parameter: "\\tau" } }),
  step("el-phi-factor2", "lost the 2 of d(r^2)/dτ", OURS, "refuted",
    { context: base, from: lagrangian, to: "r\\dot r\\dot\\phi + r^2\\ddot\\phi = 0", justification: { kind: "euler-lagrange", coordinate: "\\phi", parameter: "\\tau" } }),
  step("el-r", "the radial equation of motion", `${C5} (from memory: geodesic equation for r)`, "verified",
    { context: base, from: lagrangian, to: `\\frac{\\ddot r}{1-\\frac{r_s}{r}} - \\frac{r_s\\dot r^2}{2r^2${f}^2} + \\frac{r_s c^2\\dot t^2}{2r^2} - r\\dot\\phi^2 = 0`, justification: { kind: "euler-lagrange", coordinate: "r", parameter: "\\tau" } }),
  step("el-r-sign", "sign of the centrifugal term", OURS, "refuted",
    { context: base, from: lagrangian, to: `\\frac{\\ddot r}{1-\\frac{r_s}{r}} - \\frac{r_s\\dot r^2}{2r^2${f}^2} + \\frac{r_s c^2\\dot t^2}{2r^2} + r\\dot\\phi^2 = 0`, justification: { kind: "euler-lagrange", coordinate: "r", parameter: "\\tau" } }),
  step("el-t-general", "static spherically symmetric A(r): d/dτ(A ṫ) = 0", `${C5} (general static isotropic metric, from memory)`, "verified",
    { context: { ...base, functions: { A: ["r"], B: ["r"] } }, from: generalLagrangian, to: "\\frac{d}{d\\tau}\\left(A(r)\\dot t\\right) = 0", justification: { kind: "euler-lagrange", coordinate: "t", parameter: "\\tau" } }),
  step("el-t-general-expanded", "the same, with A'(r) written out", `${C5} (from memory)`, "verified",
    { context: { ...base, functions: { A: ["r"], B: ["r"] } }, from: generalLagrangian, to: "A'(r)\\dot r\\dot t + A(r)\\ddot t = 0", justification: { kind: "euler-lagrange", coordinate: "t", parameter: "\\tau" } }),
  step("el-t-general-chain", "chain rule forgot ṙ", OURS, "refuted",
    { context: { ...base, functions: { A: ["r"], B: ["r"] } }, from: generalLagrangian, to: "A'(r)\\dot t + A(r)\\ddot t = 0", justification: { kind: "euler-lagrange", coordinate: "t", parameter: "\\tau" } }),

  // Substituting the conserved E and L.
  step("substitute-E-L", "ṫ and φ̇ in terms of E and L", `${C5} (E and L, eqs. 5.61–5.62 from memory); ${H9}`, "verified",
    { context: withDefs(energy, angular), from: multiplied, to: withEL }),
  step("substitute-E-L-lost-c2", "E^2/(μ^2 c^4) instead of E^2/(μ^2 c^2)", OURS, "refuted",
    { context: withDefs(energy, angular), from: multiplied, to: withEL.replace("\\frac{E^2}{\\mu^2c^2}", "\\frac{E^2}{\\mu^2c^4}") }),
  step("substitute-E-L-power", "L^2/r^3 instead of L^2/r^2", OURS, "refuted",
    { context: withDefs(energy, angular), from: multiplied, to: withEL.replace("\\frac{L^2}{\\mu^2r^2}", "\\frac{L^2}{\\mu^2r^3}") }),
  step("substitute-E-L-justified", "the same as an explicit substitution", `${C5}`, "verified",
    { context: base, from: multiplied, to: withEL, justification: { kind: "substitute", relations: [energy, angular] } }),

  // Energy form with the effective potential.
  step("energy-form", "½μṙ^2 + V_eff = (E^2 - μ^2c^4)/(2μc^2)", `${C5} (eq. 5.70 from memory); ${MTW25}`, "verified",
    { context: withDefs(rs, energy, angular, veff), from: withEL, to: "\\frac{1}{2}\\mu\\dot r^2 + V_{\\rm eff} = \\frac{E^2-\\mu^2c^4}{2\\mu c^2}" }),
  step("energy-form-lost-c2", "μ^2c^2 instead of μ^2c^4", OURS, "refuted",
    { context: withDefs(rs, energy, angular, veff), from: withEL, to: "\\frac{1}{2}\\mu\\dot r^2 + V_{\\rm eff} = \\frac{E^2-\\mu^2c^2}{2\\mu c^2}" }),
  step("energy-form-factor2", "μṙ^2 without the ½", OURS, "refuted",
    { context: withDefs(rs, energy, angular, veff), from: withEL, to: "\\mu\\dot r^2 + V_{\\rm eff} = \\frac{E^2-\\mu^2c^4}{2\\mu c^2}" }),
  step("per-unit-mass", "per unit mass: ½ṙ^2 + ½(1 - r_s/r)(c^2 + ℓ^2/r^2) = ε^2/(2c^2)", `${H9} (eq. 9.28 from memory, here with c kept)`, "verified",
    { context: withDefs("\\epsilon = c^2\\left(1-\\frac{r_s}{r}\\right)\\dot t", "\\ell = r^2\\dot\\phi"), from: multiplied, to: `\\frac{1}{2}\\dot r^2 + \\frac{1}{2}${f}\\left(c^2+\\frac{\\ell^2}{r^2}\\right) = \\frac{\\epsilon^2}{2c^2}` }),
  step("per-unit-mass-sign", "sign of the ℓ^2 term", OURS, "refuted",
    { context: withDefs("\\epsilon = c^2\\left(1-\\frac{r_s}{r}\\right)\\dot t", "\\ell = r^2\\dot\\phi"), from: multiplied, to: `\\frac{1}{2}\\dot r^2 + \\frac{1}{2}${f}\\left(c^2-\\frac{\\ell^2}{r^2}\\right) = \\frac{\\epsilon^2}{2c^2}` }),

  // Definition of the effective potential.
  step("define-veff", "V_eff introduced", `${C5}; ${MTW25}`, "verified",
    { context: withDefs(rs), from: "", to: veff, justification: { kind: "definition" } }),
  step("define-circular", "a definition that uses itself", OURS, "refuted",
    { context: base, from: "", to: "E = \\mu c^2 + \\frac{E}{2}", justification: { kind: "definition" } }),

  // Differentiating V_eff.
  step("dveff", "dV_eff/dr", `${C5} (circular orbits); ${H9}`, "verified",
    { context: base, from: veff, to: "\\frac{dV_{\\rm eff}}{dr} = \\frac{GM\\mu}{r^2} - \\frac{L^2}{\\mu r^3} + \\frac{3GML^2}{\\mu c^2 r^4}", justification: { kind: "differentiate", by: "r" } }),
  step("dveff-factor3", "lost the 3 of r^-3 → r^-4", OURS, "refuted",
    { context: base, from: veff, to: "\\frac{dV_{\\rm eff}}{dr} = \\frac{GM\\mu}{r^2} - \\frac{L^2}{\\mu r^3} + \\frac{GML^2}{\\mu c^2 r^4}", justification: { kind: "differentiate", by: "r" } }),
  step("dveff-expression", "the derivative of the potential as an expression", `${C5}`, "verified",
    { context: base, from: veffRhs, to: "\\frac{GM\\mu}{r^2} - \\frac{L^2}{\\mu r^3} + \\frac{3GML^2}{\\mu c^2 r^4}", justification: { kind: "differentiate", by: "r" } }),
  step("dveff-expression-sign", "sign of the Newtonian force term", OURS, "refuted",
    { context: base, from: veffRhs, to: "-\\frac{GM\\mu}{r^2} - \\frac{L^2}{\\mu r^3} + \\frac{3GML^2}{\\mu c^2 r^4}", justification: { kind: "differentiate", by: "r" } }),

  // Circular orbits.
  step("circular", "dV_eff/dr = 0 gives L^2 = GMμ^2r^2/(r - 3GM/c^2)", `${C5} (circular orbits); ${H9} (eq. 9.? circular orbits, from memory)`, "verified",
    { context: withDefs(rs, veff), from: "\\frac{dV_{\\rm eff}}{dr} = 0", to: "L^2 = \\frac{GM\\mu^2r^2}{r-\\frac{3GM}{c^2}}" }),
  step("circular-wrong-radius", "2GM/c^2 instead of 3GM/c^2", OURS, "refuted",
    { context: withDefs(rs, veff), from: "\\frac{dV_{\\rm eff}}{dr} = 0", to: "L^2 = \\frac{GM\\mu^2r^2}{r-\\frac{2GM}{c^2}}" }),
  step("photon-sphere", "photon orbit: d/dr[(1 - r_s/r)/r^2] = 0 at r = 3r_s/2", `${H9} (photon orbits at 3GM/c^2); ${C5}`, "verified",
    { context: base, from: `\\frac{d}{dr}\\left(\\frac{1}{r^2}${f}\\right) = 0`, to: "r = \\frac{3}{2}r_s" }),
  step("photon-sphere-wrong", "r = 2r_s", OURS, "refuted",
    { context: base, from: `\\frac{d}{dr}\\left(\\frac{1}{r^2}${f}\\right) = 0`, to: "r = 2r_s" }),

  // Newtonian limit.
  step("newtonian-limit", "V_eff as c → ∞", `${C5}; ${MTW25}`, "verified",
    { context: base, from: veffRhs, to: "-\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2}", justification: { kind: "limit", symbol: "c", to: "\\infty" } }),
  step("newtonian-limit-factor2", "centrifugal term without the ½", OURS, "refuted",
    { context: base, from: veffRhs, to: "-\\frac{GM\\mu}{r} + \\frac{L^2}{\\mu r^2}", justification: { kind: "limit", symbol: "c", to: "\\infty" } }),
  step("newtonian-energy-equation", "the radial energy equation as c → ∞ keeps its Newtonian terms", `${C5} (Newtonian limit of the orbit equation); ${MTW25}`, "verified",
    { context: base, from: "\\frac{1}{2}\\mu\\dot r^2 - \\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3} = E_{N}", to: "\\frac{1}{2}\\mu\\dot r^2 - \\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} = E_{N}", justification: { kind: "limit", symbol: "c", to: "\\infty" } }),
  step("newtonian-energy-equation-sign", "the centrifugal term with the wrong sign", OURS, "refuted",
    { context: base, from: "\\frac{1}{2}\\mu\\dot r^2 - \\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3} = E_{N}", to: "\\frac{1}{2}\\mu\\dot r^2 - \\frac{GM\\mu}{r} - \\frac{L^2}{2\\mu r^2} = E_{N}", justification: { kind: "limit", symbol: "c", to: "\\infty" } }),
  step("relativistic-term-vanishes", "GML^2/(μc^2r^3) → 0", `${C5} (the relativistic correction)`, "verified",
    { context: base, from: "\\frac{GML^2}{\\mu c^2 r^3}", to: "0", justification: { kind: "limit", symbol: "c", to: "\\infty" } }),
  step("lost-c2-does-not-vanish", "with c^2 lost the term stays", OURS, "refuted",
    { context: base, from: "\\frac{GML^2}{\\mu r^3}", to: "0", justification: { kind: "limit", symbol: "c", to: "\\infty" } }),

  // Clock rates and precession.
  step("static-clock", "a static clock: dτ = √(1 - r_s/r) dt", `${H9} (gravitational redshift)`, "verified",
    { context: { ...base, assumptions: ["r > r_s", "d\\tau > 0", "dt > 0"] }, from: `-c^2 d\\tau^2 = -${f}c^2\\,dt^2`, to: "d\\tau = \\sqrt{1-\\frac{r_s}{r}}\\,dt" }),
  step("static-clock-power", "no square root", OURS, "refuted",
    { context: { ...base, assumptions: ["r > r_s", "d\\tau > 0", "dt > 0"] }, from: `-c^2 d\\tau^2 = -${f}c^2\\,dt^2`, to: `d\\tau = ${f}\\,dt` }),
  step("precession-rs", "6πGM/(c^2 a(1 - e^2)) = 3πr_s/(a(1 - e^2))", `${H9} (perihelion shift, eq. 9.? from memory); ${C5}`, "verified",
    { context: withDefs(rs), from: "\\frac{6\\pi GM}{c^2a(1-e^2)}", to: "\\frac{3\\pi r_s}{a(1-e^2)}" }),
  step("precession-rs-factor2", "6πr_s instead of 3πr_s", OURS, "refuted",
    { context: withDefs(rs), from: "\\frac{6\\pi GM}{c^2a(1-e^2)}", to: "\\frac{6\\pi r_s}{a(1-e^2)}" }),
];
