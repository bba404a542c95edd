/**
 * The expression tree every part of cas/ speaks. Parsers produce it, printers,
 * evaluators, the checker and the spacetime toolkit consume it.
 *
 * Symbol names are canonical *plain identifiers*: the LaTeX symbol with the
 * backslash dropped and subscripts written `_x` (`\theta` → `theta`,
 * `r_{s}` → `r_s`, `g_{tt}` → `g_tt`, `M_\odot` → `M_odot`). Printers map them
 * back to LaTeX.
 *
 * @example
 * // (1 - r_s/r) c^2
 * const e: Expr = mul(sub(num(1), div(sym("r_s"), sym("r"))), pow(sym("c"), num(2)));
 */
export type Expr =
  | Num
  | Sym
  | Const
  | Add
  | Mul
  | Div
  | Pow
  | Neg
  | Call
  | Dot
  | Differential
  | Deriv
  | Limit;

/** A numeric literal kept as its exact decimal text ("2", "0.5", "6.674e-11"). */
export interface Num { readonly kind: "num"; readonly value: string }
/** A named symbol (constant, coordinate, parameter), by its plain identifier. */
export interface Sym { readonly kind: "sym"; readonly name: string }
/** A mathematical constant with a fixed value. */
export interface Const { readonly kind: "const"; readonly name: "pi" | "e" | "infinity" }
export interface Add { readonly kind: "add"; readonly terms: readonly Expr[] }
export interface Mul { readonly kind: "mul"; readonly factors: readonly Expr[] }
/** A quotient, kept apart from Mul so printed fractions look as written. */
export interface Div { readonly kind: "div"; readonly num: Expr; readonly den: Expr }
export interface Pow { readonly kind: "pow"; readonly base: Expr; readonly exp: Expr }
export interface Neg { readonly kind: "neg"; readonly arg: Expr }
/**
 * A function application: a built-in (`sin cos tan sec csc cot asin acos atan
 * sinh cosh tanh exp log sqrt abs`) or an undetermined function the notebook
 * declares (`A(r)`, `a(t)`).
 */
export interface Call { readonly kind: "call"; readonly fn: string; readonly args: readonly Expr[] }
/** A derivative by the curve parameter (τ unless the context says otherwise): `\dot r` is order 1, `\ddot r` order 2. */
export interface Dot { readonly kind: "dot"; readonly name: string; readonly order: number }
/** A coordinate differential in a line element: `dt`, `\mathrm{d}r`, `d\tau`. */
export interface Differential { readonly kind: "differential"; readonly name: string }
/** An unevaluated derivative `d^n/dx^n (of)` (Leibniz notation, total or partial). */
export interface Deriv { readonly kind: "deriv"; readonly of: Expr; readonly by: string; readonly order: number; readonly partial: boolean }
/** `\lim_{symbol \to to} of`. */
export interface Limit { readonly kind: "limit"; readonly of: Expr; readonly symbol: string; readonly to: Expr }

export type RelationOp = "=" | "<" | ">" | "<=" | ">=" | "!=";

/** A relation between two expressions, `lhs op rhs`. */
export interface Relation { readonly kind: "relation"; readonly op: RelationOp; readonly lhs: Expr; readonly rhs: Expr }

/** What a reader returns: one expression or one relation. */
export type Statement = Expr | Relation;

export const BUILTIN_FUNCTIONS = [
  "sin", "cos", "tan", "sec", "csc", "cot",
  "asin", "acos", "atan",
  "sinh", "cosh", "tanh",
  "exp", "log", "sqrt", "abs",
] as const;
export type BuiltinFunction = (typeof BUILTIN_FUNCTIONS)[number];

export function isBuiltinFunction(name: string): name is BuiltinFunction {
  return (BUILTIN_FUNCTIONS as readonly string[]).includes(name);
}

export function isRelation(s: Statement): s is Relation {
  return s.kind === "relation";
}

/** The variable name under which a dotted symbol is bound in evaluation environments (`\dot r` → `r_dot`, `\ddot r` → `r_ddot`). */
export function dotVariable(name: string, order: number): string {
  return `${name}_${"d".repeat(order - 1)}dot`;
}

/** The variable name under which a differential is bound (`dt` → `d_t`). */
export function differentialVariable(name: string): string {
  return `d_${name}`;
}
