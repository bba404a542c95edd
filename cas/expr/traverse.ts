import { dotVariable, differentialVariable, type Expr, type Relation, type Statement } from "./types";

/**
 * Rebuilds a tree bottom-up, giving `visit` each node after its children were rebuilt.
 * Return the node unchanged to keep it.
 *
 * @example
 * mapExpr(e, (n) => (n.kind === "sym" && n.name === "x" ? num(2) : n))
 */
export function mapExpr(expr: Expr, visit: (e: Expr) => Expr): Expr {
  const rec = (e: Expr): Expr => {
    switch (e.kind) {
      case "num": case "sym": case "const": case "dot": case "differential":
        return visit(e);
      case "add": return visit({ kind: "add", terms: e.terms.map(rec) });
      case "mul": return visit({ kind: "mul", factors: e.factors.map(rec) });
      case "div": return visit({ kind: "div", num: rec(e.num), den: rec(e.den) });
      case "pow": return visit({ kind: "pow", base: rec(e.base), exp: rec(e.exp) });
      case "neg": return visit({ kind: "neg", arg: rec(e.arg) });
      case "call": return visit({ kind: "call", fn: e.fn, args: e.args.map(rec) });
      case "deriv": return visit({ ...e, of: rec(e.of) });
      case "limit": return visit({ ...e, of: rec(e.of), to: rec(e.to) });
    }
  };
  return rec(expr);
}

/** Calls `visit` on every node, parents before children. */
export function walkExpr(expr: Expr, visit: (e: Expr) => void): void {
  visit(expr);
  switch (expr.kind) {
    case "add": expr.terms.forEach((t) => walkExpr(t, visit)); break;
    case "mul": expr.factors.forEach((f) => walkExpr(f, visit)); break;
    case "div": walkExpr(expr.num, visit); walkExpr(expr.den, visit); break;
    case "pow": walkExpr(expr.base, visit); walkExpr(expr.exp, visit); break;
    case "neg": walkExpr(expr.arg, visit); break;
    case "call": expr.args.forEach((a) => walkExpr(a, visit)); break;
    case "deriv": walkExpr(expr.of, visit); break;
    case "limit": walkExpr(expr.of, visit); walkExpr(expr.to, visit); break;
    default: break;
  }
}

/**
 * The names a tree needs values for: symbols, dotted symbols (as `r_dot`), differentials (as `d_t`).
 * Function names are not included; see {@link functionNames}.
 */
export function freeVariables(s: Statement): Set<string> {
  const out = new Set<string>();
  const visit = (e: Expr) => {
    if (e.kind === "sym") out.add(e.name);
    else if (e.kind === "dot") out.add(dotVariable(e.name, e.order));
    else if (e.kind === "differential") out.add(differentialVariable(e.name));
  };
  if (s.kind === "relation") { walkExpr(s.lhs, visit); walkExpr(s.rhs, visit); }
  else walkExpr(s, visit);
  return out;
}

/** Names of the functions applied in a tree (built-in and undetermined). */
export function functionNames(e: Expr): Set<string> {
  const out = new Set<string>();
  walkExpr(e, (n) => { if (n.kind === "call") out.add(n.fn); });
  return out;
}

/**
 * Replaces symbols by expressions, all at once (no re-substitution into the inserted trees).
 *
 * @example
 * substitute(parsePlain("r_s/r"), { r_s: parsePlain("2*G*M/c^2") })
 */
export function substitute(expr: Expr, bindings: Readonly<Record<string, Expr>>): Expr {
  return mapExpr(expr, (e) => (e.kind === "sym" && Object.hasOwn(bindings, e.name) ? bindings[e.name] : e));
}

/** Applies {@link substitute} to both sides of a relation. */
export function substituteRelation(rel: Relation, bindings: Readonly<Record<string, Expr>>): Relation {
  return { ...rel, lhs: substitute(rel.lhs, bindings), rhs: substitute(rel.rhs, bindings) };
}

/** Number of nodes in a tree: the size measure simplifiers compare. */
export function exprSize(e: Expr): number {
  let n = 0;
  walkExpr(e, () => { n += 1; });
  return n;
}

/** Structural equality of two trees (same shape, same names, same literal text). */
export function exprEquals(a: Expr, b: Expr): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}
