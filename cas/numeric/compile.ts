import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { dotVariable, differentialVariable } from "../expr/types";
import { EvaluationError } from "./evaluate";
import type { Arithmetic } from "./arithmetic";

/**
 * Compiles a tree once into a closure, so a tree checked at many points is
 * walked once rather than once per point. Names are bound to numbered slots
 * ({@link SlotNames}); a point is an array of values in slot order.
 */
export type Compiled<N> = (point: readonly N[]) => N;

/** Slot numbers for the names compiled programs read. */
export class SlotNames {
  private readonly slots = new Map<string, number>();
  /** Names in slot order. */
  readonly names: string[] = [];
  slot(name: string): number {
    let i = this.slots.get(name);
    if (i === undefined) {
      i = this.names.length;
      this.slots.set(name, i);
      this.names.push(name);
    }
    return i;
  }
}

const X: Expr = { kind: "sym", name: "x" };
const Y: Expr = { kind: "sym", name: "y" };

function integerLiteral(e: Expr): number | null {
  if (e.kind !== "num") return null;
  const k = Number(e.value);
  return Number.isInteger(k) && Math.abs(k) <= 4096 ? k : null;
}

function compileNode<N>(A: Arithmetic<N>, e: Expr, names: SlotNames): Compiled<N> {
  const rec = (x: Expr) => compileNode(A, x, names);
  switch (e.kind) {
    case "num": return constant(() => A.literal(e.value));
    case "const":
      if (e.name === "infinity") return () => { throw new EvaluationError("infinity has no numeric value"); };
      return constant(() => A.viaDecimal(e, {}));
    case "sym": return bound(e.name, names);
    case "dot": return bound(dotVariable(e.name, e.order), names);
    case "differential": return bound(differentialVariable(e.name), names);
    case "add": return fold(e.terms.map(rec), A.add);
    case "mul": return fold(e.factors.map(rec), A.mul);
    case "div": {
      const top = rec(e.num);
      const bottom = rec(e.den);
      return (p) => A.div(top(p), bottom(p));
    }
    case "neg": {
      const arg = rec(e.arg);
      return (p) => A.neg(arg(p));
    }
    case "pow": {
      const base = rec(e.base);
      const k = integerLiteral(e.exp);
      if (k !== null) return (p) => A.powInt(base(p), k);
      if (e.exp.kind === "num" && Number(e.exp.value) === 0.5) return (p) => A.sqrt(base(p));
      const exponent = rec(e.exp);
      const general: Expr = { kind: "pow", base: X, exp: Y };
      return (p) => {
        const b = base(p);
        const x = exponent(p);
        const n = A.smallInteger(x);
        return n !== null ? A.powInt(b, n) : A.viaDecimal(general, { x: b, y: x });
      };
    }
    case "call": {
      if (e.args.length !== 1) return () => { throw new EvaluationError(`${e.fn} takes one argument`); };
      const arg = rec(e.args[0]);
      if (e.fn === "sqrt") return (p) => A.sqrt(arg(p));
      if (e.fn === "abs") return (p) => A.abs(arg(p));
      if (e.fn === "sin" || e.fn === "cos") { const fn = e.fn; return (p) => A.trig(fn, arg(p)); }
      // Other functions (rare in metrics) through decimal.js, with its domain errors.
      const tree: Expr = { kind: "call", fn: e.fn, args: [X] };
      return (p) => A.viaDecimal(tree, { x: arg(p) });
    }
    case "deriv": return () => { throw new EvaluationError(`unevaluated derivative by ${e.by}: differentiate before evaluating`); };
    case "limit": return () => { throw new EvaluationError(`unevaluated limit in ${e.symbol}: take the limit before evaluating`); };
  }
}

/** A value fixed at compile time; a failure to make it (out of range) is raised when run, like any other. */
/** A sum or product of compiled parts, folded left to right in one loop per evaluation. */
function fold<N>(parts: Compiled<N>[], op: (a: N, b: N) => N): Compiled<N> {
  return (p) => {
    let s = parts[0](p);
    for (let i = 1; i < parts.length; i += 1) s = op(s, parts[i](p));
    return s;
  };
}

function constant<N>(make: () => N): Compiled<N> {
  try {
    const v = make();
    return () => v;
  } catch (err) {
    return () => { throw err; };
  }
}

function bound<N>(name: string, names: SlotNames): Compiled<N> {
  const i = names.slot(name);
  return (p) => {
    const v = p[i];
    if (v === undefined) throw new EvaluationError(`no value for ${name}`);
    return v;
  };
}

const FROZEN_TRIG = /^(sin|cos)\(([A-Za-z][A-Za-z0-9_]*)\)$/;

/**
 * The values of every slot at a point given by decimal values of its free
 * names: a frozen "sin(x)"/"cos(x)" name (see freezeTrig) is computed from x.
 * Slots already filled are kept, so the array can grow as more trees are
 * compiled; a name without a value stays undefined (evaluation then says so).
 */
export function fillSlots<N>(A: Arithmetic<N>, names: SlotNames, values: Readonly<Record<string, Decimal>>, slots: (N | undefined)[]): void {
  const all = names.names;
  for (let i = slots.length; i < all.length; i += 1) {
    const trig = FROZEN_TRIG.exec(all[i]);
    const v = values[trig ? trig[2] : all[i]];
    slots.push(v === undefined ? undefined : trig ? A.trig(trig[1] as "sin" | "cos", A.fromDecimal(v)) : A.fromDecimal(v));
  }
}

/**
 * Compiles `expr` (jets and frozen sin/cos already made symbols) in arithmetic
 * `A`, binding its names in `names`. Running it throws an {@link EvaluationError}
 * where evaluateDecimal would: an unbound name, division by zero, a domain
 * error, a non-finite result.
 *
 * @example
 * const names = new SlotNames();
 * const f = compileTree(ddArithmetic, readPlainExpr("1 - r_s/r"), names);
 * f([ddOf(1), ddOf(4)]) // slots: r_s = 0, r = 1 → 0.75
 */
export function compileTree<N>(A: Arithmetic<N>, expr: Expr, names: SlotNames): Compiled<N> {
  const program = compileNode(A, expr, names);
  return (p) => {
    const v = program(p);
    if (!A.isFinite(v)) throw new EvaluationError("the value is not a finite number");
    return v;
  };
}
