import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { decimalContext, evaluateDecimal, EvaluationError, type DecimalContext } from "./evaluate";
import { DD, DD_DIGITS, ddAdd, ddDiv, ddFromDecimal, ddMul, ddNeg, ddPowInt, ddSinCos, ddSqrt, ddSub, ddToDecimal } from "./double-double";

/**
 * The arithmetic a compiled tree ({@link compileTree}) and the raw curvature
 * run in: double-double (fast, ~31 digits, float64 exponent range) or
 * decimal.js (any precision, any range). Operations that can fail throw an
 * {@link EvaluationError}, as evaluateDecimal does.
 */
export interface Arithmetic<N> {
  /** Significant digits the arithmetic carries. */
  readonly digits: number;
  readonly zero: N;
  readonly half: N;
  literal(text: string): N;
  fromDecimal(x: Decimal): N;
  add(a: N, b: N): N;
  sub(a: N, b: N): N;
  mul(a: N, b: N): N;
  /** Throws on a zero divisor. */
  div(a: N, b: N): N;
  neg(a: N): N;
  /** a^k, k an integer; throws for 0^(negative). */
  powInt(a: N, k: number): N;
  /** Throws for a negative argument. */
  sqrt(a: N): N;
  isZero(a: N): boolean;
  /** The value if it is an integer of modest size (a power computed by squaring), else null. */
  smallInteger(a: N): number | null;
  /** |a| as a float64: for choosing pivots and comparing sizes, never for a verdict. */
  size(a: N): number;
  /** |a|. */
  abs(a: N): N;
  /** sin a or cos a. */
  trig(fn: "sin" | "cos", a: N): N;
  /** The nearest float64 (for eigenvalues of a probe matrix, never for a verdict). */
  toNumber(a: N): number;
  /** Is |a| ≤ tolerance · max(1, |scale|)? The one comparison verdicts are made with. */
  negligible(a: N, scale: N, tolerance: number): boolean;
  /** A tree of one function application or a general power over names bound to N values, through decimal.js. */
  viaDecimal(tree: Expr, values: Record<string, N>): N;
  /** Is a a finite value (not overflowed)? */
  isFinite(a: N): boolean;
}

/** Raised when a double-double value leaves the range where its 31 digits are safe (|x| in [1e-200, 1e200] or 0). */
export class OutOfRangeError extends EvaluationError {
  constructor() {
    super("a value left the double-double range");
    this.name = "OutOfRangeError";
  }
}

const SMALLEST = 1e-200;
const LARGEST = 1e200;
const MAX_POWER = 4096;

// Products and quotients are where a value can overflow or underflow; a sum of
// in-range values stays representable, and its lo part stays a normal float.
function inRange(x: DD): DD {
  const m = Math.abs(x.hi);
  if (m > LARGEST || (m < SMALLEST && m !== 0) || Number.isNaN(m)) throw new OutOfRangeError();
  return x;
}

const D40 = decimalContext(40);
const ddLiterals = new Map<string, DD>();
const SIN: Expr = { kind: "call", fn: "sin", args: [{ kind: "sym", name: "x" }] };
const COS: Expr = { kind: "call", fn: "cos", args: [{ kind: "sym", name: "x" }] };

function ddViaDecimal(tree: Expr, values: Record<string, DD>): DD {
  const decimals: Record<string, Decimal> = {};
  for (const k of Object.keys(values)) decimals[k] = ddToDecimal(D40, values[k]);
  return inRange(ddFromDecimal(D40, evaluateDecimal(D40, tree, { values: decimals })));
}

/**
 * Double-double arithmetic whose products, quotients and powers throw an
 * {@link OutOfRangeError} outside [1e-200, 1e200] (including a product of
 * non-zero numbers that underflows to 0), so no silent loss of digits can make
 * two different values look equal. Callers fall back to decimal.js then.
 */
export const ddArithmetic: Arithmetic<DD> = {
  digits: DD_DIGITS,
  zero: new DD(0, 0),
  half: new DD(0.5, 0),
  literal: (text) => {
    let v = ddLiterals.get(text);
    if (v === undefined) {
      v = inRange(ddFromDecimal(D40, new D40(text)));
      if (ddLiterals.size < 10_000) ddLiterals.set(text, v);
    }
    return v;
  },
  fromDecimal: (x) => inRange(ddFromDecimal(D40, x)),
  add: ddAdd,
  sub: ddSub,
  mul: (a, b) => {
    const p = ddMul(a, b);
    if (p.hi === 0 && a.hi !== 0 && b.hi !== 0) throw new OutOfRangeError();
    return inRange(p);
  },
  div: (a, b) => {
    if (b.hi === 0) throw new EvaluationError("division by zero");
    const q = ddDiv(a, b);
    if (q.hi === 0 && a.hi !== 0) throw new OutOfRangeError();
    return inRange(q);
  },
  neg: ddNeg,
  powInt: (a, k) => {
    if (a.hi === 0) {
      if (k < 0) throw new EvaluationError("division by zero");
      return k === 0 ? new DD(1, 0) : a;
    }
    return inRange(ddPowInt(a, k));
  },
  sqrt: (a) => {
    if (a.hi < 0) throw new EvaluationError("square root of a negative number");
    return ddSqrt(a);
  },
  isZero: (a) => a.hi === 0,
  smallInteger: (a) => (Number.isInteger(a.hi) && Number.isInteger(a.lo) && Math.abs(a.hi) <= MAX_POWER ? a.hi + a.lo : null),
  size: (a) => Math.abs(a.hi),
  abs: (a) => (a.hi < 0 ? ddNeg(a) : a),
  // hi carries the value to 1e-16 relative: ample for a tolerance of 1e-11 and above.
  negligible: (a, scale, tolerance) => Math.abs(a.hi) <= tolerance * Math.max(1, Math.abs(scale.hi)),
  trig: (fn, a) => {
    const both = ddSinCos(a);
    return both ? both[fn] : ddViaDecimal(fn === "sin" ? SIN : COS, { x: a });
  },
  toNumber: (a) => a.hi + a.lo,
  viaDecimal: ddViaDecimal,
  isFinite: (a) => Number.isFinite(a.hi) && Number.isFinite(a.lo),
};

/** decimal.js arithmetic at the precision of D: slower, but any exponent range. */
export function decimalArithmetic(D: DecimalContext): Arithmetic<Decimal> {
  const one = new D(1);
  return {
    digits: D.precision,
    zero: new D(0),
    half: new D("0.5"),
    literal: (text) => new D(text),
    fromDecimal: (x) => new D(x),
    add: (a, b) => a.plus(b),
    sub: (a, b) => a.minus(b),
    mul: (a, b) => a.times(b),
    div: (a, b) => {
      if (b.isZero()) throw new EvaluationError("division by zero");
      return a.div(b);
    },
    neg: (a) => a.neg(),
    powInt: (a, k) => {
      if (a.isZero() && k < 0) throw new EvaluationError("division by zero");
      return a.pow(k);
    },
    sqrt: (a) => {
      if (a.isNegative()) throw new EvaluationError("square root of a negative number");
      return a.sqrt();
    },
    isZero: (a) => a.isZero(),
    smallInteger: (a) => (a.isInteger() && a.abs().lte(MAX_POWER) ? a.toNumber() : null),
    size: (a) => a.abs().toNumber(),
    abs: (a) => a.abs(),
    trig: (fn, a) => (fn === "sin" ? a.sin() : a.cos()),
    toNumber: (a) => a.toNumber(),
    negligible: (a, scale, tolerance) => a.abs().lte(D.max(one, scale.abs()).times(tolerance)),
    viaDecimal: (tree, values) => evaluateDecimal(D, tree, { values }),
    isFinite: (a) => a.isFinite(),
  };
}
