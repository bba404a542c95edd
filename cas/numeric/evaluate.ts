import Decimal from "decimal.js";
import { dotVariable, differentialVariable, type Expr } from "../expr/types";

/** Raised when a tree cannot be given a number (unbound symbol, unevaluated derivative, domain error). */
export class EvaluationError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "EvaluationError";
  }
}

/** Values for the free names of a tree: symbols, dotted symbols (`r_dot`), differentials (`d_t`), and undetermined functions. */
export interface Environment<N> {
  readonly values: Readonly<Record<string, N>>;
  readonly functions?: Readonly<Record<string, (args: N[]) => N>>;
}

/** Arithmetic an evaluator needs; implemented for float64 and for decimal.js. */
interface Field<N> {
  fromLiteral(text: string): N;
  pi(): N;
  e(): N;
  add(a: N, b: N): N;
  mul(a: N, b: N): N;
  div(a: N, b: N): N;
  neg(a: N): N;
  pow(a: N, b: N): N;
  call(fn: string, x: N): N | undefined;
  isFinite(a: N): boolean;
}

function evaluateIn<N>(field: Field<N>, expr: Expr, env: Environment<N>): N {
  const rec = (e: Expr): N => {
    switch (e.kind) {
      case "num":
        return field.fromLiteral(e.value);
      case "const":
        if (e.name === "pi") return field.pi();
        if (e.name === "e") return field.e();
        throw new EvaluationError("infinity has no numeric value");
      case "sym":
        return bound(e.name);
      case "dot":
        return bound(dotVariable(e.name, e.order));
      case "differential":
        return bound(differentialVariable(e.name));
      case "add":
        return e.terms.map(rec).reduce((a, b) => field.add(a, b));
      case "mul":
        return e.factors.map(rec).reduce((a, b) => field.mul(a, b));
      case "div":
        return field.div(rec(e.num), rec(e.den));
      case "pow":
        return field.pow(rec(e.base), rec(e.exp));
      case "neg":
        return field.neg(rec(e.arg));
      case "call": {
        const args = e.args.map(rec);
        const user = env.functions?.[e.fn];
        if (user) return user(args);
        if (args.length !== 1) throw new EvaluationError(`${e.fn} takes one argument`);
        const out = field.call(e.fn, args[0]);
        if (out === undefined) throw new EvaluationError(`no value for the function ${e.fn}`);
        return out;
      }
      case "deriv":
        throw new EvaluationError(`unevaluated derivative by ${e.by}: differentiate before evaluating`);
      case "limit":
        throw new EvaluationError(`unevaluated limit in ${e.symbol}: take the limit before evaluating`);
    }
  };
  const bound = (name: string): N => {
    const v = env.values[name];
    if (v === undefined) throw new EvaluationError(`no value for ${name}`);
    return v;
  };
  const result = rec(expr);
  if (!field.isFinite(result)) throw new EvaluationError("the value is not a finite number");
  return result;
}

const floatField: Field<number> = {
  fromLiteral: (t) => Number(t),
  pi: () => Math.PI,
  e: () => Math.E,
  add: (a, b) => a + b,
  mul: (a, b) => a * b,
  div: (a, b) => a / b,
  neg: (a) => -a,
  pow: (a, b) => Math.pow(a, b),
  call: (fn, x) => {
    switch (fn) {
      case "sin": return Math.sin(x);
      case "cos": return Math.cos(x);
      case "tan": return Math.tan(x);
      case "sec": return 1 / Math.cos(x);
      case "csc": return 1 / Math.sin(x);
      case "cot": return 1 / Math.tan(x);
      case "asin": return Math.asin(x);
      case "acos": return Math.acos(x);
      case "atan": return Math.atan(x);
      case "sinh": return Math.sinh(x);
      case "cosh": return Math.cosh(x);
      case "tanh": return Math.tanh(x);
      case "exp": return Math.exp(x);
      case "log": return Math.log(x);
      case "sqrt": return Math.sqrt(x);
      case "abs": return Math.abs(x);
      default: return undefined;
    }
  },
  isFinite: (a) => Number.isFinite(a),
};

/**
 * Evaluates a tree in float64. Fast, for plots and orbit numbers; use
 * {@link evaluateDecimal} wherever a verdict depends on the value.
 *
 * @example
 * evaluateFloat(parsePlain("1 - r_s/r"), { values: { r_s: 1, r: 4 } }) // 0.75
 */
export function evaluateFloat(expr: Expr, env: Environment<number>): number {
  return evaluateIn(floatField, expr, env);
}

/** A decimal.js constructor with its own precision, so callers never change the global one. */
export type DecimalContext = typeof Decimal;

/** Makes a decimal.js constructor working at `digits` significant digits. */
export function decimalContext(digits: number): DecimalContext {
  return Decimal.clone({ precision: digits, rounding: Decimal.ROUND_HALF_EVEN, toExpNeg: -30, toExpPos: 30 });
}

// One field per precision context, with π and e computed once: acos(−1) at 50 digits costs more than a whole evaluation.
const decimalFields = new WeakMap<DecimalContext, Field<Decimal>>();

function decimalField(D: DecimalContext): Field<Decimal> {
  const cached = decimalFields.get(D);
  if (cached) return cached;
  const field = makeDecimalField(D);
  decimalFields.set(D, field);
  return field;
}

function makeDecimalField(D: DecimalContext): Field<Decimal> {
  const one = new D(1);
  let piValue: Decimal | undefined;
  let eValue: Decimal | undefined;
  const literals = new Map<string, Decimal>();
  return {
    fromLiteral: (t) => {
      let v = literals.get(t);
      if (!v) {
        v = new D(t);
        if (literals.size < 10_000) literals.set(t, v);
      }
      return v;
    },
    pi: () => (piValue ??= D.acos(-1)),
    e: () => (eValue ??= D.exp(1)),
    add: (a, b) => a.plus(b),
    mul: (a, b) => a.times(b),
    div: (a, b) => {
      if (b.isZero()) throw new EvaluationError("division by zero");
      return a.div(b);
    },
    neg: (a) => a.neg(),
    pow: (a, b) => {
      if (a.isNegative() && !b.isInteger()) throw new EvaluationError("a negative number raised to a non-integer power");
      if (a.isZero() && b.isNegative()) throw new EvaluationError("division by zero");
      return a.pow(b);
    },
    call: (fn, x) => {
      switch (fn) {
        case "sin": return x.sin();
        case "cos": return x.cos();
        case "tan": return x.tan();
        case "sec": return one.div(x.cos());
        case "csc": return one.div(x.sin());
        case "cot": return one.div(x.tan());
        case "asin": return x.asin();
        case "acos": return x.acos();
        case "atan": return x.atan();
        case "sinh": return x.sinh();
        case "cosh": return x.cosh();
        case "tanh": return x.tanh();
        case "exp": return x.exp();
        case "log":
          if (!x.isPositive()) throw new EvaluationError("log of a non-positive number");
          return x.ln();
        case "sqrt":
          if (x.isNegative()) throw new EvaluationError("square root of a negative number");
          return x.sqrt();
        case "abs": return x.abs();
        default: return undefined;
      }
    },
    isFinite: (a) => a.isFinite(),
  };
}

/**
 * Evaluates a tree with decimal.js at the precision of `D` (see {@link decimalContext}).
 * Throws {@link EvaluationError} on domain errors rather than returning NaN.
 *
 * @example
 * const D = decimalContext(40);
 * evaluateDecimal(D, expr, { values: { r: new D(3) } });
 */
export function evaluateDecimal(D: DecimalContext, expr: Expr, env: Environment<Decimal>): Decimal {
  return evaluateIn(decimalField(D), expr, env);
}
