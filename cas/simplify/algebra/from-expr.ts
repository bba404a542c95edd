import type { Expr } from "../../expr/types";
import { isBuiltinFunction } from "../../expr/types";
import { qFromDecimal } from "./rational-number";
import { polyVar } from "./polynomial";
import {
  type RatFun, rfAdd, rfConst, rfConstant, rfDiv, rfInv, rfMul, rfNeg, rfOne, rfPoly, rfPow,
} from "./ratfun";
import type { Atom, Ring } from "./ring";
import { rfDerivativeBy } from "./calculus";

/** Raised when a tree holds something rational arithmetic cannot represent (a limit, ∞, a huge power). */
export class NotRationalError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "NotRationalError";
  }
}

/** Integer powers above this are refused: (x+1)^100000 must not expand. */
const MAX_POWER = 64;

export function rfAtom(ring: Ring, atom: Atom): RatFun {
  return rfPoly(polyVar(ring.variable(atom)));
}

/**
 * Reads a tree into a rational function over `ring`. sin/cos of a symbol,
 * undetermined functions and their derivatives become variables; sqrt, exp and
 * symbolic powers become opaque variables.
 *
 * @example
 * toRatFun(ring, readPlainExpr("(1 - r_s/r)^(-1)"))  // r / (r - r_s)
 */
export function toRatFun(ring: Ring, e: Expr): RatFun {
  const rec = (n: Expr): RatFun => {
    switch (n.kind) {
      case "num": return rfConst(qFromDecimal(n.value));
      case "sym": return rfAtom(ring, { kind: "sym", name: n.name });
      case "const":
        if (n.name === "infinity") throw new NotRationalError("∞ is not a value");
        return rfAtom(ring, { kind: "const", name: n.name });
      case "dot": return rfAtom(ring, { kind: "dot", name: n.name, order: n.order });
      case "differential": return rfAtom(ring, { kind: "differential", name: n.name });
      case "add": return n.terms.reduce((acc, t) => rfAdd(ring, acc, rec(t)), rfConst({ n: 0n, d: 1n }));
      case "mul": return n.factors.reduce((acc, f) => rfMul(ring, acc, rec(f)), rfOne());
      case "div": return rfDiv(ring, rec(n.num), rec(n.den));
      case "neg": return rfNeg(rec(n.arg));
      case "pow": {
        const exp = integerExponent(ring, n.exp);
        if (exp === null) return rfAtom(ring, { kind: "opaque", expr: n });
        if (Math.abs(exp) > MAX_POWER) throw new NotRationalError(`the power ${exp} is too large to expand`);
        return rfPow(ring, rec(n.base), exp);
      }
      case "call": return call(n.fn, n.args, n);
      case "deriv": {
        let out = rec(n.of);
        for (let i = 0; i < n.order; i += 1) out = rfDerivativeBy(ring, out, n.by);
        return out;
      }
      case "limit": throw new NotRationalError("an unevaluated limit");
    }
  };
  const call = (fn: string, args: readonly Expr[], whole: Expr): RatFun => {
    const arg = args.length === 1 && args[0].kind === "sym" ? args[0].name : null;
    if (arg !== null) {
      const sin = () => rfAtom(ring, { kind: "sin", arg });
      const cos = () => rfAtom(ring, { kind: "cos", arg });
      switch (fn) {
        case "sin": return sin();
        case "cos": return cos();
        case "tan": return rfDiv(ring, sin(), cos());
        case "cot": return rfDiv(ring, cos(), sin());
        case "sec": return rfInv(ring, cos());
        case "csc": return rfInv(ring, sin());
        default: break;
      }
    }
    if (!isBuiltinFunction(fn) && args.every((a) => a.kind === "sym")) {
      const names = args.map((a) => (a as { name: string }).name);
      return rfAtom(ring, { kind: "fn", fn, args: names, orders: names.map(() => 0) });
    }
    return rfAtom(ring, { kind: "opaque", expr: whole });
  };
  return rec(e);
}

function integerExponent(ring: Ring, e: Expr): number | null {
  if (e.kind === "num") {
    const v = Number(e.value);
    return Number.isInteger(v) ? v : null;
  }
  if (e.kind === "neg" && e.arg.kind === "num") {
    const v = Number(e.arg.value);
    return Number.isInteger(v) ? -v : null;
  }
  if (e.kind === "div" || e.kind === "mul" || e.kind === "add") {
    try {
      const c = rfConstant(toRatFun(ring, e));
      if (c !== null && c.d === 1n) return Number(c.n);
    } catch { /* not a number */ }
  }
  return null;
}
