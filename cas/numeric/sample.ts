import type Decimal from "decimal.js";
import type { Expr, Relation } from "../expr/types";
import { freeVariables } from "../expr/traverse";
import { evaluateDecimal, type DecimalContext } from "./evaluate";
import { randomDecimalText, type RandomStream } from "./random";

/**
 * Where sample points may lie. Variables are drawn positive in [0.5, 2.5)
 * unless they are `signed` (dotted symbols, differentials) or a condition bounds
 * them: physics symbols (masses, radii, c, G) are positive, and values of order
 * one keep every term comparable so no cancellation hides a difference.
 */
export interface Domain {
  /** Variables drawn at random. */
  readonly variables: readonly string[];
  /** Variables fixed by an equality assumption (θ = π/2), computed once the variables they use are drawn. */
  readonly fixed: readonly { readonly variable: string; readonly value: Expr }[];
  /** Relations every point must satisfy (r > r_s, c > 0); checked on every point, and used as bounds when one side is a lone variable. */
  readonly conditions: readonly Relation[];
  /** Variables that may take either sign. */
  readonly signed: ReadonlySet<string>;
}

export type Point = Record<string, Decimal>;

interface Bounds { lows: Expr[]; highs: Expr[] }

/** Reads `v > e`, `e < v` and friends as bounds on v. */
function boundsOf(conditions: readonly Relation[], variables: readonly string[]): Map<string, Bounds> {
  const out = new Map<string, Bounds>(variables.map((v) => [v, { lows: [], highs: [] }]));
  for (const c of conditions) {
    const pairs: [Expr, "low" | "high", Expr][] = [];
    const greater = c.op === ">" || c.op === ">=";
    const less = c.op === "<" || c.op === "<=";
    if (!greater && !less) continue;
    pairs.push([c.lhs, greater ? "low" : "high", c.rhs]);
    pairs.push([c.rhs, greater ? "high" : "low", c.lhs]);
    for (const [side, kind, other] of pairs) {
      if (side.kind !== "sym" || !out.has(side.name)) continue;
      if (freeVariables(other).has(side.name)) continue;
      const b = out.get(side.name)!;
      (kind === "low" ? b.lows : b.highs).push(other);
    }
  }
  return out;
}

/** Orders variables so that each one's bounds are drawn before it; a cycle of bounds is broken by dropping the bound that closes it. */
function drawOrder(variables: readonly string[], bounds: Map<string, Bounds>, fixed: Map<string, Expr>): string[] {
  const order: string[] = [];
  const state = new Map<string, "visiting" | "done">();
  const known = (w: string) => bounds.has(w) || fixed.has(w);
  const visit = (v: string) => {
    if (state.get(v) === "done" || state.get(v) === "visiting") return;
    state.set(v, "visiting");
    const b = bounds.get(v);
    const needs = fixed.has(v) ? [fixed.get(v)!] : [...(b?.lows ?? []), ...(b?.highs ?? [])];
    for (const e of needs) for (const w of freeVariables(e)) if (known(w)) visit(w);
    state.set(v, "done");
    order.push(v);
  };
  variables.forEach(visit);
  fixed.forEach((_, v) => visit(v));
  return order;
}

/** True when `lhs op rhs` holds at the point (strictly, no tolerance: a condition is a domain restriction). */
export function conditionHolds(D: DecimalContext, c: Relation, point: Point): boolean {
  try {
    const l = evaluateDecimal(D, c.lhs, { values: point });
    const r = evaluateDecimal(D, c.rhs, { values: point });
    switch (c.op) {
      case "<": return l.lt(r);
      case ">": return l.gt(r);
      case "<=": return l.lte(r);
      case ">=": return l.gte(r);
      case "=": return l.minus(r).abs().lte(l.abs().plus(r.abs()).times(new D(10).pow(-(D.precision - 12))));
      case "!=": return !l.eq(r);
    }
  } catch {
    return false;
  }
}

/**
 * A sampler for a domain: each call draws one point that satisfies every
 * condition, or returns null after `attempts` rejected draws.
 *
 * @example
 * const draw = pointSampler(D, { variables: ["r", "r_s"], fixed: [], conditions: [rel(sym("r"), ">", sym("r_s"))], signed: new Set() }, rng);
 * draw() // { r_s: 1.31…, r: 2.87… }
 */
export function pointSampler(D: DecimalContext, domain: Domain, rng: RandomStream, attempts = 40): () => Point | null {
  const fixed = new Map(domain.fixed.map((f) => [f.variable, f.value]));
  const drawn = domain.variables.filter((v) => !fixed.has(v));
  const bounds = boundsOf(domain.conditions, drawn);
  const order = drawOrder(drawn, bounds, fixed);
  const u = (lo: number, hi: number) => new D(randomDecimalText(rng, lo, hi));
  // Distance from a one-sided bound: half the draws spread evenly, half crowd towards the bound
  // (log-uniform down to 10^-3 of its size), so a claim that fails only near r = 3GM/c² is caught.
  const gap = () => (rng.next() < 0.5 ? u(0.1, 3) : new D(10).pow(new D(randomDecimalText(rng, -3, 0.45))));
  const draw = (v: string, point: Point): Decimal | null => {
    const f = fixed.get(v);
    if (f) {
      try { return evaluateDecimal(D, f, { values: point }); } catch { return null; }
    }
    const b = bounds.get(v)!;
    const value = (e: Expr) => {
      try { return evaluateDecimal(D, e, { values: point }); } catch { return null; }
    };
    const lows = b.lows.map(value).filter((x): x is Decimal => x !== null);
    const highs = b.highs.map(value).filter((x): x is Decimal => x !== null);
    const lo = lows.length ? D.max(...lows) : null;
    const hi = highs.length ? D.min(...highs) : null;
    if (lo && hi) return lo.lt(hi) ? lo.plus(hi.minus(lo).times(u(0.05, 0.95))) : null;
    if (lo) return lo.plus(D.max(lo.abs(), 0.5).times(gap()));
    if (hi) {
      if (domain.signed.has(v) || hi.lte(0)) return hi.minus(D.max(hi.abs(), 0.5).times(gap()));
      return hi.times(u(0.05, 0.95));
    }
    if (domain.signed.has(v)) return u(0.3, 2.5).times(rng.next() < 0.5 ? -1 : 1);
    return u(0.5, 2.5);
  };
  return () => {
    for (let attempt = 0; attempt < attempts; attempt += 1) {
      const point: Point = {};
      let ok = true;
      for (const v of order) {
        const x = draw(v, point);
        if (x === null) { ok = false; break; }
        point[v] = x;
      }
      if (ok && domain.conditions.every((c) => conditionHolds(D, c, point))) return point;
    }
    return null;
  };
}
