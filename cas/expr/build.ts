import type { Expr, Relation, RelationOp } from "./types";

/**
 * Small constructors for the expression tree; they do no simplification.
 *
 * @example
 * add(num(1), neg(div(sym("r_s"), sym("r"))))   // 1 - r_s/r
 */
export const num = (value: number | string): Expr => ({ kind: "num", value: String(value) });
export const sym = (name: string): Expr => ({ kind: "sym", name });
export const pi: Expr = { kind: "const", name: "pi" };
export const euler: Expr = { kind: "const", name: "e" };
export const infinity: Expr = { kind: "const", name: "infinity" };
export const add = (...terms: Expr[]): Expr => ({ kind: "add", terms });
export const mul = (...factors: Expr[]): Expr => ({ kind: "mul", factors });
export const div = (n: Expr, d: Expr): Expr => ({ kind: "div", num: n, den: d });
export const pow = (base: Expr, exp: Expr): Expr => ({ kind: "pow", base, exp });
export const neg = (arg: Expr): Expr => ({ kind: "neg", arg });
export const sub = (a: Expr, b: Expr): Expr => add(a, neg(b));
export const call = (fn: string, ...args: Expr[]): Expr => ({ kind: "call", fn, args });
export const dot = (name: string, order = 1): Expr => ({ kind: "dot", name, order });
export const differential = (name: string): Expr => ({ kind: "differential", name });
export const deriv = (of: Expr, by: string, order = 1, partial = false): Expr => ({ kind: "deriv", of, by, order, partial });
export const limit = (of: Expr, symbol: string, to: Expr): Expr => ({ kind: "limit", of, symbol, to });
export const relation = (lhs: Expr, op: RelationOp, rhs: Expr): Relation => ({ kind: "relation", op, lhs, rhs });
