import type { Expr } from "../expr/types";
import { dotVariable } from "../expr/types";
import { dot, neg, num, pow, sym } from "../expr/build";
import { exprSize, freeVariables, mapExpr, substitute } from "../expr/traverse";
import { differentiate, productOf, sumOf } from "../calculus/differentiate";
import { polyVar } from "../simplify/algebra/polynomial";
import { type RatFun, rfAdd, rfConst, rfDerivative, rfDiv, rfIsZero, rfMul, rfNeg, rfOne, rfPoly, rfScale, rfSub, rfZero } from "../simplify/algebra/ratfun";
import { rfDerivativeBy } from "../simplify/algebra/calculus";
import { toRatFun } from "../simplify/algebra/from-expr";
import { fromRatFun } from "../simplify/algebra/to-expr";
import type { Ring } from "../simplify/algebra/ring";
import { q } from "../simplify/algebra/rational-number";
import { jetify, probeEqual, randomSource, randomValues } from "../simplify/probe";
import { decimalContext, evaluateDecimal } from "../numeric/evaluate";
import type { Metric } from "./metric";
import { geometryOf } from "./geometry";
import { validateMetric } from "./validate";

export interface EulerLagrangeEquation {
  readonly coordinate: string;
  readonly index: number;
  /** [d/dτ(∂L/∂ẋ^k) − ∂L/∂x^k] / (2 g_kk) (or / 2 when g_kk = 0); the equation is this = 0. */
  readonly expr: Expr;
}

export interface KillingVector {
  readonly coordinate: string;
  readonly index: number;
  /** ξ^a = δ^a_k */
  readonly components: readonly number[];
}

export interface ConservedQuantity {
  readonly coordinate: string;
  readonly index: number;
  readonly name: "energy" | "angular momentum" | "momentum";
  /** E/μ = −g_{kb} ẋ^b for the time coordinate, L/μ = g_{kb} ẋ^b otherwise. */
  readonly perUnitMass: Expr;
  /** The same times the test mass μ. */
  readonly withMass: Expr;
}

export interface GeodesicSystem {
  readonly parameter: string;
  /** L = g_ab ẋ^a ẋ^b. */
  readonly lagrangian: Expr;
  readonly equations: readonly EulerLagrangeEquation[];
  readonly killing: readonly KillingVector[];
  readonly conserved: readonly ConservedQuantity[];
  /** g_ab ẋ^a ẋ^b takes −c² (or −1 without a c) on timelike and 0 on null geodesics. */
  readonly normalisation: { readonly timelike: Expr; readonly null: Expr };
}

const ANGLES = new Set(["phi", "varphi", "psi"]);

/** d/dτ along the curve: coordinates become their dots, dots go up one order. */
function totalDerivative(ring: Ring, f: RatFun, coordinates: readonly string[], parameter: string): RatFun {
  const dotOf = (name: string, order: number) => rfPoly(polyVar(ring.variable({ kind: "dot", name, order })));
  return rfDerivative(ring, f, (v) => {
    const a = ring.atoms[v];
    switch (a.kind) {
      case "sym": return coordinates.includes(a.name) ? dotOf(a.name, 1) : null;
      case "dot": return coordinates.includes(a.name) ? dotOf(a.name, a.order + 1) : null;
      case "sin": return coordinates.includes(a.arg) ? rfMul(ring, rfPoly(polyVar(ring.variable({ kind: "cos", arg: a.arg }))), dotOf(a.arg, 1)) : null;
      case "cos": return coordinates.includes(a.arg) ? rfNeg(rfMul(ring, rfPoly(polyVar(ring.variable({ kind: "sin", arg: a.arg }))), dotOf(a.arg, 1))) : null;
      case "fn": {
        let out = rfZero();
        a.args.forEach((arg, i) => {
          if (!coordinates.includes(arg)) return;
          const orders = a.orders.map((o, j) => (j === i ? o + 1 : o));
          out = rfAdd(ring, out, rfMul(ring, rfPoly(polyVar(ring.variable({ kind: "fn", fn: a.fn, args: a.args, orders }))), dotOf(arg, 1)));
        });
        return rfIsZero(out) ? null : out;
      }
      case "opaque": return toRatFun(ring, differentiate(a.expr, parameter, { coordinates }));
      default: return null;
    }
  });
}

/** The Euler–Lagrange expression straight from trees (ẋ as a symbol), to check the rational one against. */
function rawEulerLagrange(lagrangian: Expr, x: string, coordinates: readonly string[], parameter: string): Expr {
  const dotName = dotVariable(x, 1);
  const asSymbols = mapExpr(lagrangian, (e) => (e.kind === "dot" && e.name === x && e.order === 1 ? sym(dotName) : e));
  const momentum = substitute(differentiate(asSymbols, dotName), { [dotName]: dot(x, 1) });
  return sumOf([differentiate(momentum, parameter, { coordinates }), productOf([num(-1), differentiate(lagrangian, x)])]);
}

const shortest = (ring: Ring, f: RatFun) => {
  const a = fromRatFun(ring, f, "factored");
  const b = fromRatFun(ring, f, "expanded");
  return exprSize(b) < exprSize(a) ? b : a;
};

/**
 * The geodesic Lagrangian g_ab ẋ^a ẋ^b, its Euler–Lagrange equations, the
 * Killing vectors ∂_k of cyclic coordinates and their Noether quantities.
 * Each equation is checked against a tree-level derivation at random points.
 *
 * @example
 * geodesics(schwarzschild).conserved[0].perUnitMass // c^2 (1 - r_s/r) ṫ
 */
export function geodesics(metric: Metric, parameter = "tau"): GeodesicSystem {
  const geo = geometryOf(metric);
  const { ring, n, g, coordinates } = geo;
  const dotOf = (k: number) => rfPoly(polyVar(ring.variable({ kind: "dot", name: coordinates[k], order: 1 })));
  let lagrangian = rfZero();
  for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) {
    if (!rfIsZero(g[a][b])) lagrangian = rfAdd(ring, lagrangian, rfMul(ring, g[a][b], rfMul(ring, dotOf(a), dotOf(b))));
  }
  // Written term by term, g_ab ẋ^a ẋ^b, as a reader expects it — not over one denominator.
  const lagrangianTerms: Expr[] = [];
  for (let a = 0; a < n; a += 1) for (let b = a; b < n; b += 1) {
    if (rfIsZero(g[a][b])) continue;
    const coefficient = shortest(ring, a === b ? g[a][b] : rfScale(g[a][b], q(2n)));
    const dots = a === b ? [{ kind: "pow", base: dot(coordinates[a], 1), exp: num(2) } as Expr] : [dot(coordinates[a], 1), dot(coordinates[b], 1)];
    lagrangianTerms.push(productOf([coefficient, ...dots]));
  }
  const lagrangianExpr = sumOf(lagrangianTerms);
  const equations = coordinates.map((x, k) => {
    const dotIndex = ring.variable({ kind: "dot", name: x, order: 1 });
    const momentum = rfDerivative(ring, lagrangian, (v) => (v === dotIndex ? rfOne() : null));
    const el = rfSub(ring, totalDerivative(ring, momentum, coordinates, parameter), rfDerivativeBy(ring, lagrangian, x));
    // Divided by 2 g_kk (when non-zero) so a diagonal metric gives the geodesic equation ẍ^k + Γ^k_ab ẋ^a ẋ^b = 0.
    const scale = rfIsZero(g[k][k]) ? rfConst(q(2n)) : rfScale(g[k][k], q(2n));
    const expr = shortest(ring, rfDiv(ring, el, scale));
    const raw = { kind: "div", num: rawEulerLagrange(lagrangianExpr, x, coordinates, parameter), den: productOf([num(2), rfIsZero(g[k][k]) ? num(1) : metric.components[k][k]]) } as Expr;
    if (probeEqual(raw, expr).kind === "different") throw new Error(`internal error: the Euler–Lagrange equation for ${x} failed its check`);
    return { coordinate: x, index: k, expr };
  });
  const cyclic = coordinates.map((x, k) => k).filter((k) => geo.dg[k].every((row) => row.every(rfIsZero)));
  const killing = cyclic.map((k) => ({ coordinate: coordinates[k], index: k, components: coordinates.map((_, a) => (a === k ? 1 : 0)) }));
  const hasC = metric.components.some((row) => row.some((e) => JSON.stringify(e).includes('"name":"c"')));
  const signature = validateMetric(metric);
  const timeLike = (k: number) => signature.negative === 1 && signFarOut(metric.components[k][k]) < 0;
  const conserved = cyclic.map((k): ConservedQuantity => {
    let p = rfZero();
    for (let b = 0; b < n; b += 1) if (!rfIsZero(g[k][b])) p = rfAdd(ring, p, rfMul(ring, g[k][b], dotOf(b)));
    const isTime = timeLike(k);
    const perUnit = isTime ? rfNeg(p) : p;
    const name = isTime ? "energy" : ANGLES.has(coordinates[k]) ? "angular momentum" : "momentum";
    return {
      coordinate: coordinates[k], index: k, name,
      perUnitMass: shortest(ring, perUnit),
      withMass: shortest(ring, rfMul(ring, perUnit, toRatFun(ring, sym("mu")))),
    };
  });
  return {
    parameter,
    lagrangian: lagrangianExpr,
    equations,
    killing,
    conserved,
    normalisation: { timelike: hasC ? neg(pow(sym("c"), num(2))) : num(-1), null: num(0) },
  };
}

/**
 * The sign of a metric component at a random point well away from horizons
 * (r scaled up): enough to tell the time coordinate among the cyclic ones.
 */
function signFarOut(e: Expr): number {
  const D = decimalContext(20);
  const j = jetify(e);
  const next = randomSource(3);
  for (let i = 0; i < 10; i += 1) {
    const values = randomValues(D, freeVariables(j), next);
    if (values.r) values.r = values.r.times(50);
    try { const v = evaluateDecimal(D, j, { values }); return v.isZero() ? 0 : v.isNegative() ? -1 : 1; } catch { /* try another point */ }
  }
  return 0;
}
