import type { Expr, Relation } from "../expr/types";
import { add, div, mul, num, pow, relation, sub, sym, dot } from "../expr/build";
import { exprSize, substitute } from "../expr/traverse";
import { Ring } from "../simplify/algebra/ring";
import { toRatFun } from "../simplify/algebra/from-expr";
import { fromRatFun } from "../simplify/algebra/to-expr";
import { exponentOf, polyOne } from "../simplify/algebra/polynomial";
import { type RatFun, rfIsZero, rfMul, rfPoly, rfSub, rfOne } from "../simplify/algebra/ratfun";
import { probeEqual } from "../simplify/probe";
import { MetricError, type Metric } from "./metric";

/** One additive term of the effective potential and what it becomes as c → ∞. */
export interface PotentialTerm {
  readonly name: "Newtonian attraction" | "centrifugal" | "relativistic correction" | "other";
  readonly expr: Expr;
  /** The term's limit as c → ∞: an expression, or "infinity" when it grows without bound, or null in geometric units (no c). */
  readonly limit: Expr | "infinity" | null;
}

export interface EffectivePotential {
  /** A(r) = −g_tt/c² and B(r) = g_rr of −A c² dt² + B dr² + r² dΩ². */
  readonly A: Expr;
  readonly B: Expr;
  /** E = μ c² A ṫ, L = μ r² φ̇ (as relations). */
  readonly conserved: { readonly energy: Relation; readonly angularMomentum: Relation };
  /** ½ μ A B ṙ² + V_eff = (E² − μ² c⁴)/(2 μ c²). */
  readonly radialEquation: Relation;
  /** V_eff = ½ μ c² (A − 1) + L² A/(2 μ r²), in its shortest verified form. */
  readonly effectivePotential: Expr;
  readonly terms: readonly PotentialTerm[];
  /** Per unit mass in geometric units (G = c = 1, E and L per unit μ): ½ A B ṙ² + Ṽ = (E² − 1)/2, Ṽ = ½(A − 1) + L² A/(2 r²). */
  readonly perUnitMass: { readonly radialEquation: Relation; readonly effectivePotential: Expr };
  /** The null-geodesic form: ½ A B ṙ² + L² A/(2 r²) = E²/(2 c²), with E = c² A ṫ, L = r² φ̇. */
  readonly nullRadialEquation: Relation;
  /** Whether A·B = 1 (then the radial equation has the Newtonian ½ μ ṙ²). */
  readonly abIsOne: boolean;
}

const MU = sym("mu");
const E = sym("E");
const L = sym("L");
const C = sym("c");
const R = sym("r");
const sq = (e: Expr) => pow(e, num(2));

function shortestRational(e: Expr): Expr {
  try {
    const ring = new Ring();
    ring.variable({ kind: "sym", name: "r" });
    const f = toRatFun(ring, e);
    const a = fromRatFun(ring, f, "factored");
    const b = fromRatFun(ring, f, "expanded");
    const best = exprSize(b) < exprSize(a) ? b : a;
    return exprSize(best) < exprSize(e) && probeEqual(e, best).kind === "equal" ? best : e;
  } catch {
    return e;
  }
}

/**
 * Checks the metric is static and spherically symmetric in the coordinates
 * (t, r, θ, φ) — diagonal, g_θθ = r², g_φφ = r² sin²θ, g_tt and g_rr functions
 * of r only — and reads off A and B.
 */
export function staticSphericalParts(metric: Metric, usesC: boolean): { A: Expr; B: Expr } {
  if (metric.coordinates.length !== 4) throw new MetricError("the effective potential needs four coordinates (t, r, θ, φ)");
  const [t, r, theta, phi] = metric.coordinates;
  const g = metric.components;
  for (let a = 0; a < 4; a += 1) for (let b = 0; b < 4; b += 1) {
    if (a !== b && probeEqual(g[a][b], num(0)).kind !== "equal") throw new MetricError("the effective potential needs a diagonal metric −A c² dt² + B dr² + r² dΩ²");
  }
  const rr = sq(sym(r));
  if (probeEqual(g[2][2], rr).kind !== "equal") throw new MetricError(`g_${theta}${theta} must be ${r}^2`);
  if (probeEqual(g[3][3], mul(rr, sq({ kind: "call", fn: "sin", args: [sym(theta)] }))).kind !== "equal") throw new MetricError(`g_${phi}${phi} must be ${r}^2 sin^2 ${theta}`);
  const ring = new Ring();
  for (const [name, comp] of [["g_tt", g[0][0]], ["g_rr", g[1][1]]] as const) {
    const f = toRatFun(ring, comp);
    const depends = ring.atoms.some((a, v) => (a.kind === "sym" && (a.name === t || a.name === theta || a.name === phi)) && [...f.num.keys()].some((k) => exponentOf(k, v) > 0));
    if (depends) throw new MetricError(`${name} must depend on ${r} only (a static, spherically symmetric metric)`);
  }
  const rename = (e: Expr) => (r === "r" ? e : substitute(e, { [r]: R }));
  const A = shortestRational(rename(usesC ? div(mul(num(-1), g[0][0]), sq(C)) : mul(num(-1), g[0][0])));
  const B = shortestRational(rename(g[1][1]));
  return { A, B };
}

function classify(ring: Ring, f: RatFun, usesC: boolean): PotentialTerm[] {
  // Split over a monomial denominator into terms; otherwise keep V whole.
  const monomialDen = [...f.den.keys()].every((id) => ring.factors[id].size === 1);
  const pieces: RatFun[] = monomialDen ? [...f.num].map(([k, c]) => rfMul(ring, rfPoly(new Map([[k, c]])), { num: polyOne(), den: f.den })) : [f];
  const cIndex = usesC ? ring.variable({ kind: "sym", name: "c" }) : -1;
  const lIndex = ring.variable({ kind: "sym", name: "L" });
  const rIndex = ring.variable({ kind: "sym", name: "r" });
  const degreeIn = (p: RatFun, v: number) => {
    let top = -Infinity;
    for (const k of p.num.keys()) top = Math.max(top, exponentOf(k, v));
    let bottom = 0;
    for (const [id, e] of p.den) bottom += e * Math.max(0, ...[...ring.factors[id].keys()].map((k) => exponentOf(k, v)));
    return top - bottom;
  };
  const terms = pieces.map((p) => {
    const expr = fromRatFun(ring, p, "factored");
    const hasL = [...p.num.keys()].some((k) => exponentOf(k, lIndex) > 0);
    const rPower = degreeIn(p, rIndex);
    let limit: PotentialTerm["limit"] = null;
    let name: PotentialTerm["name"];
    if (usesC) {
      const cPower = degreeIn(p, cIndex);
      limit = cPower < 0 ? num(0) : cPower > 0 ? "infinity" : expr;
      name = cPower < 0 ? "relativistic correction" : cPower > 0 ? "other" : hasL && rPower === -2 ? "centrifugal" : !hasL && rPower === -1 ? "Newtonian attraction" : "other";
    } else {
      name = hasL && rPower === -2 ? "centrifugal" : !hasL && rPower === -1 ? "Newtonian attraction" : hasL && rPower === -3 ? "relativistic correction" : "other";
    }
    return { term: { name, expr, limit }, rPower };
  });
  // Newtonian attraction (1/r), centrifugal (1/r²), correction (1/r³): falling powers of r.
  return terms.sort((x, y) => y.rPower - x.rPower).map((t) => t.term);
}

/**
 * The radial equation and effective potential of a static, spherically
 * symmetric metric in the equatorial plane (θ = π/2), in the energy form
 * ½ μ (dr/dτ)² + V_eff(r) = (E² − μ²c⁴)/(2μc²) with E = μc²A ṫ and L = μr²φ̇.
 *
 * @example
 * effectivePotential(schwarzschildWithGM).terms.map((t) => t.name)
 * // ["Newtonian attraction", "centrifugal", "relativistic correction"]
 */
export function effectivePotential(metric: Metric, definitions: Readonly<Record<string, Expr>> = {}): EffectivePotential {
  const given: Metric = { coordinates: metric.coordinates, components: metric.components.map((row) => row.map((e) => substitute(e, definitions))) };
  const usesC = given.components.some((row) => row.some((e) => JSON.stringify(e).includes('"name":"c"')));
  const { A, B } = staticSphericalParts(given, usesC);
  const c2 = usesC ? sq(C) : num(1);
  const ringAB = new Ring();
  const ab = rfSub(ringAB, toRatFun(ringAB, mul(A, B)), rfOne());
  const abIsOne = rfIsZero(ab) || probeEqual(mul(A, B), num(1)).kind === "equal";
  const kinetic = (m: Expr) => (abIsOne ? mul(div(num(1), num(2)), m, sq(dot("r"))) : mul(div(num(1), num(2)), m, A, B, sq(dot("r"))));
  const raw = add(mul(div(num(1), num(2)), MU, c2, sub(A, num(1))), div(mul(sq(L), A), mul(num(2), MU, sq(R))));
  const ring = new Ring();
  ring.variable({ kind: "sym", name: "r" });
  const vf = toRatFun(ring, raw);
  const candidates = [fromRatFun(ring, vf, "expanded"), fromRatFun(ring, vf, "factored"), raw].sort((x, y) => exprSize(x) - exprSize(y));
  const V = candidates.find((cand) => probeEqual(raw, cand).kind === "equal") ?? raw;
  const geometric = (e: Expr) => substitute(e, { c: num(1), mu: num(1) });
  const perUnitV = shortestRational(geometric(raw));
  return {
    A, B,
    conserved: {
      energy: relation(E, "=", mul(MU, c2, A, dot("t"))),
      angularMomentum: relation(L, "=", mul(MU, sq(R), dot("phi"))),
    },
    radialEquation: relation(add(kinetic(MU), sym("V_eff")), "=", div(sub(sq(E), mul(sq(MU), pow(C, num(usesC ? 4 : 0)))), mul(num(2), MU, c2))),
    effectivePotential: V,
    terms: classify(ring, vf, usesC),
    perUnitMass: {
      radialEquation: relation(add(kinetic(num(1)), sym("V_eff")), "=", div(sub(sq(E), num(1)), num(2))),
      effectivePotential: perUnitV,
    },
    nullRadialEquation: relation(add(kinetic(num(1)), div(mul(sq(L), A), mul(num(2), sq(R)))), "=", div(sq(E), mul(num(2), c2))),
    abIsOne,
  };
}
