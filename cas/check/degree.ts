import type { Expr } from "../expr/types";

/**
 * The degree of a tree as a polynomial in `variable`, or null when it is not
 * one (the variable under a division, a function or a non-integer power).
 * Used to pick which variable a relation is solved for: degree 1 or 2 has a
 * closed-form root.
 *
 * @example
 * polynomialDegree(parsePlain("G*M*mu/r^2 - L^2/(mu*r^3)"), "L")  // 2
 * polynomialDegree(parsePlain("G*M*mu/r^2 - L^2/(mu*r^3)"), "mu") // null
 */
export function polynomialDegree(e: Expr, variable: string): number | null {
  const rec = (x: Expr): number | null => polynomialDegree(x, variable);
  switch (e.kind) {
    case "num": case "const": case "dot": case "differential": return 0;
    case "sym": return e.name === variable ? 1 : 0;
    case "neg": return rec(e.arg);
    case "add": case "mul": {
      const parts = (e.kind === "add" ? e.terms : e.factors).map(rec);
      if (parts.some((p) => p === null)) return null;
      return e.kind === "add" ? Math.max(...(parts as number[])) : (parts as number[]).reduce((a, b) => a + b, 0);
    }
    case "div": {
      const d = rec(e.den);
      return d === 0 ? rec(e.num) : null;
    }
    case "pow": {
      const b = rec(e.base);
      if (b === 0 && rec(e.exp) === 0) return 0;
      if (b === null || e.exp.kind !== "num") return null;
      const n = Number(e.exp.value);
      return Number.isInteger(n) && n >= 0 ? b * n : null;
    }
    case "call": return e.args.every((a) => rec(a) === 0) ? 0 : null;
    case "deriv": case "limit": return rec(e.of) === 0 ? 0 : null;
  }
}
