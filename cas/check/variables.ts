import type { Expr, Statement } from "../expr/types";
import { dotVariable, differentialVariable } from "../expr/types";
import { mapExpr, walkExpr } from "../expr/traverse";
import { sym } from "../expr/build";

/**
 * The checker's variables: plain symbols, dotted symbols (`r_dot`, `r_ddot`)
 * and differentials (`d_t`), all named the way evaluation environments name them.
 */
export function variableOf(e: Expr): string | null {
  if (e.kind === "sym") return e.name;
  if (e.kind === "dot") return dotVariable(e.name, e.order);
  if (e.kind === "differential") return differentialVariable(e.name);
  return null;
}

/**
 * Replaces variables (symbols, dots, differentials) by trees, all at once.
 *
 * @example
 * bindVariables(parsePlain("E/mu"), new Map([["E", parsePlain("mu*c^2")]])) // mu*c^2/mu
 */
export function bindVariables(e: Expr, bindings: ReadonlyMap<string, Expr>): Expr {
  if (bindings.size === 0) return e;
  return mapExpr(e, (n) => {
    const v = variableOf(n);
    return v !== null && bindings.has(v) ? bindings.get(v)! : n;
  });
}

export function mapStatement(s: Statement, f: (e: Expr) => Expr): Statement {
  return s.kind === "relation" ? { ...s, lhs: f(s.lhs), rhs: f(s.rhs) } : f(s);
}

export function walkStatement(s: Statement, visit: (e: Expr) => void): void {
  if (s.kind === "relation") { walkExpr(s.lhs, visit); walkExpr(s.rhs, visit); }
  else walkExpr(s, visit);
}

/** Turns dots and differentials into symbols with their variable names, so every later stage sees plain symbols. */
export function flatten(e: Expr): Expr {
  return mapExpr(e, (n) => (n.kind === "dot" || n.kind === "differential" ? sym(variableOf(n)!) : n));
}

/** Names of the coordinates that appear dotted or as differentials. */
export function movingNames(statements: readonly Statement[]): Set<string> {
  const out = new Set<string>();
  for (const s of statements) walkStatement(s, (n) => { if (n.kind === "dot" || n.kind === "differential") out.add(n.name); });
  return out;
}

/** Variables that may take either sign when sampled: velocities and differentials. */
export function signedVariables(statements: readonly Statement[]): Set<string> {
  const out = new Set<string>();
  for (const s of statements) walkStatement(s, (n) => { if (n.kind === "dot" || n.kind === "differential") out.add(variableOf(n)!); });
  return out;
}
