import { differentiate } from "../../calculus/differentiate";
import { polyVar } from "./polynomial";
import { type RatFun, rfDerivative, rfNeg, rfOne, rfPoly } from "./ratfun";
import type { Ring } from "./ring";
import { toRatFun } from "./from-expr";

const cache = new WeakMap<Ring, Map<string, RatFun | null>>();

/** d(variable v)/d(symbol x), or null when it does not depend on x. */
export function variableDerivative(ring: Ring, v: number, x: string): RatFun | null {
  let memo = cache.get(ring);
  if (!memo) { memo = new Map(); cache.set(ring, memo); }
  const key = `${v}|${x}`;
  if (memo.has(key)) return memo.get(key)!;
  const out = compute(ring, v, x);
  memo.set(key, out);
  return out;
}

function compute(ring: Ring, v: number, x: string): RatFun | null {
  const a = ring.atoms[v];
  switch (a.kind) {
    case "sym": return a.name === x ? rfOne() : null;
    case "const": case "dot": case "differential": return null;
    case "sin": return a.arg === x ? rfPoly(polyVar(ring.variable({ kind: "cos", arg: a.arg }))) : null;
    case "cos": return a.arg === x ? rfNeg(rfPoly(polyVar(ring.variable({ kind: "sin", arg: a.arg })))) : null;
    case "fn": {
      if (!a.args.includes(x)) return null;
      // Repeated arguments f(x, x) would need a sum; undetermined functions of a repeated argument do not occur in metrics.
      const i = a.args.indexOf(x);
      const orders = a.orders.map((o, j) => (j === i ? o + 1 : o));
      return rfPoly(polyVar(ring.variable({ kind: "fn", fn: a.fn, args: a.args, orders })));
    }
    case "opaque": {
      const d = differentiate(a.expr, x);
      return d.kind === "num" && Number(d.value) === 0 ? null : toRatFun(ring, d);
    }
  }
}

/**
 * Partial derivative of a rational function by a symbol, through every variable
 * that depends on it (sin θ, A(r), opaque trees).
 *
 * @example
 * rfDerivativeBy(ring, toRatFun(ring, readPlainExpr("1 - r_s/r")), "r") // r_s/r^2
 */
export function rfDerivativeBy(ring: Ring, a: RatFun, x: string): RatFun {
  return rfDerivative(ring, a, (v) => variableDerivative(ring, v, x));
}
