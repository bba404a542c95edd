import type { Expr } from "../expr/types";
import { exprSize, walkExpr } from "../expr/traverse";
import { Ring } from "./algebra/ring";
import { toRatFun } from "./algebra/from-expr";
import { fromRatFun } from "./algebra/to-expr";

/**
 * Both written forms of an expression's exact rational normal form: over one
 * common denominator, common factors cancelled, cos² rewritten as 1 − sin².
 * Empty when the tree cannot be read as a rational function.
 *
 * @example
 * rationalCandidates(readPlainExpr("1/(r - r_s) - 1/r"))  // [r_s/(r (r - r_s))]
 */
export function rationalCandidates(expr: Expr): Expr[] {
  try {
    const ring = new Ring();
    // Register short names first (r before r_s) so factors print as r - r_s.
    const names: string[] = [];
    walkExpr(expr, (n) => { if (n.kind === "sym") names.push(n.name); });
    [...new Set(names)].sort((a, b) => a.length - b.length || (a < b ? -1 : 1)).forEach((name) => ring.variable({ kind: "sym", name }));
    const f = toRatFun(ring, expr);
    const factored = fromRatFun(ring, f, "factored");
    const expanded = fromRatFun(ring, f, "expanded");
    return exprSize(expanded) < exprSize(factored) ? [expanded, factored] : [factored, expanded];
  } catch {
    return [];
  }
}

/**
 * Strategy: the rational normal form when it is smaller than the input, else the input.
 *
 * @example
 * rationalNormal(readPlainExpr("sin(theta)^2 + cos(theta)^2"))  // 1
 */
export function rationalNormal(expr: Expr): Expr {
  const [best] = rationalCandidates(expr);
  return best !== undefined && exprSize(best) < exprSize(expr) ? best : expr;
}
