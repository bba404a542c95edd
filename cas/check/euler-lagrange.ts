import type { Expr } from "../expr/types";
import { add, dot, neg, sym } from "../expr/build";
import { mapExpr, walkExpr } from "../expr/traverse";
import { differentiate } from "../calculus/differentiate";

// Dotted coordinates become symbols with these names while L is differentiated by them.
const MARK = "\u2039dot\u203a";
const marker = (name: string, order: number) => `${MARK}${order}:${name}`;

function markDots(e: Expr): Expr {
  return mapExpr(e, (n) => (n.kind === "dot" ? sym(marker(n.name, n.order)) : n));
}

function unmarkDots(e: Expr): Expr {
  return mapExpr(e, (n) => {
    if (n.kind !== "sym" || !n.name.startsWith(MARK)) return n;
    const [order, name] = n.name.slice(MARK.length).split(":");
    return dot(name, Number(order));
  });
}

/**
 * The Euler–Lagrange expression d/dτ(∂L/∂ẋ) − ∂L/∂x for the coordinate x,
 * with ẋ and x treated as independent in the partial derivatives and the
 * τ-derivative taken along the curve (every coordinate in `coordinates` moves).
 *
 * @example
 * eulerLagrange(parsePlain("r^2*phi_dot^2"), "phi", "tau", ["r", "phi"])
 * // d/dτ(2 r² φ̇) − 0 = 4 r ṙ φ̇ + 2 r² φ̈
 */
export function eulerLagrange(lagrangian: Expr, coordinate: string, parameter: string, coordinates: readonly string[]): Expr {
  const moving = new Set(coordinates);
  moving.add(coordinate);
  walkExpr(lagrangian, (n) => { if (n.kind === "dot") moving.add(n.name); });
  moving.delete(parameter);
  const marked = markDots(lagrangian);
  const momentum = unmarkDots(differentiate(marked, marker(coordinate, 1)));
  const force = unmarkDots(differentiate(marked, coordinate));
  const change = differentiate(momentum, parameter, { coordinates: [...moving] });
  return add(change, neg(force));
}
