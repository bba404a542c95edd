import type { Expr } from "../expr/types";
import { call, num } from "../expr/build";

/**
 * Symbolic derivative of a tree with respect to one variable, with light
 * folding of 0 and 1 so results stay small. Undetermined functions `A(r)` give
 * an unevaluated `deriv` node (`A'(r)` as d/dr A(r)) by the chain rule.
 *
 * `dotted` lets a total derivative by the curve parameter treat `\dot r` as the
 * derivative of r: pass `{ parameter: "tau" }` and every symbol named in
 * `coordinates` differentiates to its dotted form.
 *
 * @example
 * differentiate(parsePlain("1 - r_s/r"), "r")   // r_s/r^2 (folded)
 */
export function differentiate(expr: Expr, by: string, options: DifferentiateOptions = {}): Expr {
  return new Differentiator(by, options).d(expr);
}

export interface DifferentiateOptions {
  /** For a total derivative by the curve parameter: the coordinates whose derivative is their dot. */
  readonly coordinates?: readonly string[];
}

const ZERO = num(0);
const ONE = num(1);
const isNum = (e: Expr, v: number) => e.kind === "num" && Number(e.value) === v;

/** Folding constructors: they drop zeros and ones, nothing more. */
export function sumOf(terms: Expr[]): Expr {
  const kept = terms.filter((t) => !isNum(t, 0));
  if (kept.length === 0) return ZERO;
  if (kept.length === 1) return kept[0];
  return { kind: "add", terms: kept };
}
export function productOf(factors: Expr[]): Expr {
  if (factors.some((f) => isNum(f, 0))) return ZERO;
  const kept = factors.filter((f) => !isNum(f, 1));
  if (kept.length === 0) return ONE;
  if (kept.length === 1) return kept[0];
  return { kind: "mul", factors: kept };
}
export function negationOf(e: Expr): Expr {
  if (isNum(e, 0)) return ZERO;
  if (e.kind === "neg") return e.arg;
  return { kind: "neg", arg: e };
}
export function quotientOf(n: Expr, d: Expr): Expr {
  if (isNum(n, 0)) return ZERO;
  if (isNum(d, 1)) return n;
  return { kind: "div", num: n, den: d };
}
export function powerOf(base: Expr, exp: Expr): Expr {
  if (isNum(exp, 0)) return ONE;
  if (isNum(exp, 1)) return base;
  return { kind: "pow", base, exp };
}

function dependsOn(e: Expr, v: string, coords: readonly string[]): boolean {
  switch (e.kind) {
    case "num": case "const": case "differential": return false;
    case "sym": return e.name === v || coords.includes(e.name);
    case "dot": return coords.length > 0 && coords.includes(e.name);
    case "add": return e.terms.some((t) => dependsOn(t, v, coords));
    case "mul": return e.factors.some((f) => dependsOn(f, v, coords));
    case "div": return dependsOn(e.num, v, coords) || dependsOn(e.den, v, coords);
    case "pow": return dependsOn(e.base, v, coords) || dependsOn(e.exp, v, coords);
    case "neg": return dependsOn(e.arg, v, coords);
    case "call": return e.args.some((a) => dependsOn(a, v, coords));
    case "deriv": return dependsOn(e.of, v, coords);
    case "limit": return dependsOn(e.of, v, coords);
  }
}

class Differentiator {
  private readonly coords: readonly string[];
  constructor(private readonly by: string, options: DifferentiateOptions) {
    this.coords = options.coordinates ?? [];
  }

  d(e: Expr): Expr {
    if (!dependsOn(e, this.by, this.coords)) return ZERO;
    switch (e.kind) {
      case "sym":
        if (e.name === this.by) return ONE;
        return { kind: "dot", name: e.name, order: 1 }; // a coordinate along the curve
      case "dot":
        return { kind: "dot", name: e.name, order: e.order + 1 };
      case "add":
        return sumOf(e.terms.map((t) => this.d(t)));
      case "neg":
        return negationOf(this.d(e.arg));
      case "mul":
        return sumOf(e.factors.map((f, i) => productOf(e.factors.map((g, j) => (i === j ? this.d(f) : g)))));
      case "div": {
        // (u/v)' = u'/v - u v'/v^2
        const du = this.d(e.num);
        const dv = this.d(e.den);
        return sumOf([quotientOf(du, e.den), negationOf(quotientOf(productOf([e.num, dv]), powerOf(e.den, num(2))))]);
      }
      case "pow":
        return this.dPow(e.base, e.exp);
      case "call":
        return this.dCall(e.fn, e.args);
      case "deriv":
        if (e.by === this.by) return { ...e, order: e.order + 1 };
        return { kind: "deriv", of: e, by: this.by, order: 1, partial: e.partial };
      case "limit":
        return { kind: "deriv", of: e, by: this.by, order: 1, partial: false };
      default:
        return ZERO;
    }
  }

  private dPow(base: Expr, exp: Expr): Expr {
    const expVaries = dependsOn(exp, this.by, this.coords);
    if (!expVaries) {
      // (u^n)' = n u^(n-1) u'
      const lowered = exp.kind === "num" ? num(trimNumber(Number(exp.value) - 1)) : sumOf([exp, num(-1)]);
      return productOf([exp, powerOf(base, lowered), this.d(base)]);
    }
    // (u^v)' = u^v (v' ln u + v u'/u)
    return productOf([
      { kind: "pow", base, exp },
      sumOf([productOf([this.d(exp), call("log", base)]), quotientOf(productOf([exp, this.d(base)]), base)]),
    ]);
  }

  private dCall(fn: string, args: readonly Expr[]): Expr {
    const outer = (u: Expr): Expr | undefined => {
      switch (fn) {
        case "sin": return call("cos", u);
        case "cos": return negationOf(call("sin", u));
        case "tan": return powerOf(call("sec", u), num(2));
        case "sec": return productOf([call("sec", u), call("tan", u)]);
        case "csc": return negationOf(productOf([call("csc", u), call("cot", u)]));
        case "cot": return negationOf(powerOf(call("csc", u), num(2)));
        case "asin": return quotientOf(ONE, call("sqrt", sumOf([ONE, negationOf(powerOf(u, num(2)))])));
        case "acos": return negationOf(quotientOf(ONE, call("sqrt", sumOf([ONE, negationOf(powerOf(u, num(2)))]))));
        case "atan": return quotientOf(ONE, sumOf([ONE, powerOf(u, num(2))]));
        case "sinh": return call("cosh", u);
        case "cosh": return call("sinh", u);
        case "tanh": return sumOf([ONE, negationOf(powerOf(call("tanh", u), num(2)))]);
        case "exp": return call("exp", u);
        case "log": return quotientOf(ONE, u);
        case "sqrt": return quotientOf(ONE, productOf([num(2), call("sqrt", u)]));
        case "abs": return quotientOf(u, call("abs", u));
        default: return undefined;
      }
    };
    if (args.length === 1) {
      const o = outer(args[0]);
      if (o) return productOf([o, this.d(args[0])]);
    }
    // Undetermined function: chain rule over its arguments, each partial left unevaluated.
    const self: Expr = { kind: "call", fn, args };
    return sumOf(
      args.map((a) => {
        if (a.kind === "sym") return productOf([{ kind: "deriv", of: self, by: a.name, order: 1, partial: args.length > 1 }, this.d(a)]);
        // A'(g(x)) would need a node for "derivative of A at g"; say so rather than guess.
        throw new Error(`cannot differentiate the undetermined function ${fn} of a compound argument`);
      }),
    );
  }
}

function trimNumber(n: number): string {
  return String(n);
}
