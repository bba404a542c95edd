import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { isBuiltinFunction } from "../expr/types";
import { sym } from "../expr/build";
import { freeVariables, mapExpr } from "../expr/traverse";
import { decimalContext, evaluateDecimal, type DecimalContext } from "../numeric/evaluate";

/**
 * Small numeric probing helpers for the simplifier and the spacetime toolkit:
 * a seeded random source, random points, and a way to evaluate trees holding
 * undetermined functions (each function value and derivative at the point is
 * an independent random number — a "jet" — which is exactly what an identity
 * between such trees must survive).
 */

/** A seeded pseudo-random source in [0, 1) (mulberry32), so a failed probe can be replayed. */
export function randomSource(seed = 0x5eed): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** The variable name a jet of an undetermined function is bound to: `A'(r)` → "A[1](r)". */
export function jetName(fn: string, args: readonly string[], orders: readonly number[]): string {
  return `${fn}[${orders.join(",")}](${args.join(",")})`;
}

/**
 * Replaces undetermined functions and their derivatives by jet symbols so the
 * tree can be evaluated.
 *
 * @example
 * jetify(deriv(call("A", sym("r")), "r"))  // sym("A[1](r)")
 */
export function jetify(e: Expr): Expr {
  const asJet = (n: Expr): Expr | null => {
    const orders = new Map<string, number>();
    let cur = n;
    while (cur.kind === "deriv") {
      orders.set(cur.by, (orders.get(cur.by) ?? 0) + cur.order);
      cur = cur.of;
    }
    if (cur.kind !== "call" || isBuiltinFunction(cur.fn) || !cur.args.every((a) => a.kind === "sym")) return null;
    const args = cur.args.map((a) => (a as { name: string }).name);
    if ([...orders.keys()].some((by) => !args.includes(by))) return null;
    return sym(jetName(cur.fn, args, args.map((a) => orders.get(a) ?? 0)));
  };
  const rec = (n: Expr): Expr => {
    const jet = n.kind === "deriv" || n.kind === "call" ? asJet(n) : null;
    if (jet) return jet;
    switch (n.kind) {
      case "add": return { kind: "add", terms: n.terms.map(rec) };
      case "mul": return { kind: "mul", factors: n.factors.map(rec) };
      case "div": return { kind: "div", num: rec(n.num), den: rec(n.den) };
      case "pow": return { kind: "pow", base: rec(n.base), exp: rec(n.exp) };
      case "neg": return { kind: "neg", arg: rec(n.arg) };
      case "call": return { kind: "call", fn: n.fn, args: n.args.map(rec) };
      case "deriv": return { ...n, of: rec(n.of) };
      case "limit": return { ...n, of: rec(n.of), to: rec(n.to) };
      default: return n;
    }
  };
  return rec(e);
}

/** Random values in [low, high) for the given names, at the precision of D. */
export function randomValues(D: DecimalContext, names: Iterable<string>, next: () => number, low = 0.6, high = 2.4): Record<string, Decimal> {
  const out: Record<string, Decimal> = {};
  for (const name of names) out[name] = new D(low + (high - low) * next()).toDecimalPlaces(12);
  return out;
}

export interface ProbeOptions {
  /** Points that must evaluate on both sides (default 5). */
  readonly points?: number;
  /** Significant digits (default 40). */
  readonly digits?: number;
  readonly seed?: number;
}

/** How two trees compared numerically: "equal" at every point tried, "different" (with the point), or "unknown" when too few points evaluated. */
export type ProbeResult =
  | { readonly kind: "equal"; readonly points: number; readonly digits: number }
  | { readonly kind: "different"; readonly at: Record<string, string> }
  | { readonly kind: "unknown"; readonly reason: string };

/**
 * Compares two trees at random points with decimal.js. Points where either side
 * has no value (a pole, sqrt of a negative) are skipped; a relative tolerance
 * of 10^(12 − digits) absorbs rounding in long raw expressions.
 *
 * @example
 * probeEqual(readPlainExpr("(r^2-1)/(r-1)"), readPlainExpr("r+1")).kind // "equal"
 */
export function probeEqual(a: Expr, b: Expr, options: ProbeOptions = {}): ProbeResult {
  const points = options.points ?? 5;
  const digits = options.digits ?? 40;
  const D = decimalContext(digits);
  const ja = jetify(a);
  const jb = jetify(b);
  const names = new Set([...freeVariables(ja), ...freeVariables(jb)]);
  const next = randomSource(options.seed);
  const tolerance = new D(10).pow(12 - digits);
  let good = 0;
  for (let attempt = 0; attempt < points * 4 && good < points; attempt += 1) {
    const values = randomValues(D, names, next);
    let va: Decimal;
    let vb: Decimal;
    try {
      va = evaluateDecimal(D, ja, { values });
      vb = evaluateDecimal(D, jb, { values });
    } catch {
      continue;
    }
    const scale = D.max(1, va.abs(), vb.abs());
    if (va.minus(vb).abs().gt(tolerance.times(scale))) {
      return { kind: "different", at: Object.fromEntries(Object.entries(values).map(([k, v]) => [k, v.toString()])) };
    }
    good += 1;
  }
  if (good < points) return { kind: "unknown", reason: `only ${good} of ${points} random points could be evaluated` };
  return { kind: "equal", points, digits };
}

const TRIG_NAME = /^(sin|cos)\(([A-Za-z][A-Za-z0-9_]*)\)$/;

/**
 * Replaces sin x and cos x of a symbol by symbols named "sin(x)", "cos(x)", so
 * a point computes each once instead of once per tree (decimal.js sine is a
 * Taylor series). Pair with {@link completeTrigValues}.
 *
 * @example
 * freezeTrig(call("sin", sym("theta")))  // sym("sin(theta)")
 */
export function freezeTrig(e: Expr): Expr {
  return mapExpr(e, (n) => (n.kind === "call" && (n.fn === "sin" || n.fn === "cos") && n.args.length === 1 && n.args[0].kind === "sym" ? sym(`${n.fn}(${n.args[0].name})`) : n));
}

/** Splits names into the free ones and the symbols the frozen sin/cos names depend on. */
export function freeNamesOf(names: Iterable<string>): Set<string> {
  const out = new Set<string>();
  for (const name of names) {
    const m = TRIG_NAME.exec(name);
    out.add(m ? m[2] : name);
  }
  return out;
}

/** Adds the values of every frozen "sin(x)" / "cos(x)" name in `names`. */
export function completeTrigValues(names: Iterable<string>, values: Record<string, Decimal>): Record<string, Decimal> {
  for (const name of names) {
    const m = TRIG_NAME.exec(name);
    if (!m || values[name] !== undefined) continue;
    const x = values[m[2]];
    if (x !== undefined) values[name] = m[1] === "sin" ? x.sin() : x.cos();
  }
  return values;
}
