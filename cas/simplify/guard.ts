import type { Expr } from "../expr/types";
import { exprSize } from "../expr/traverse";
import { probeEqual, type ProbeOptions } from "./probe";

/**
 * The simplifier's one gate: a candidate replaces the original only if it is
 * strictly smaller (node count) AND equals the original at random points with
 * high precision. Anything else — longer, different, or undecidable — keeps
 * the original.
 *
 * @example
 * acceptIfEqual(readPlainExpr("(r^2-1)/(r-1)"), readPlainExpr("r+1"))  // true
 * acceptIfEqual(readPlainExpr("(r^2-1)/(r-1)"), readPlainExpr("r-1"))  // false
 */
export function acceptIfEqual(original: Expr, candidate: Expr, options: ProbeOptions = {}): boolean {
  if (exprSize(candidate) >= exprSize(original)) return false;
  return probeEqual(original, candidate, options).kind === "equal";
}
