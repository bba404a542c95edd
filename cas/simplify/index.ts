import type { Expr } from "../expr/types";
import { exprSize } from "../expr/traverse";
import { acceptIfEqual } from "./guard";
import type { ProbeOptions } from "./probe";
import { rationalNormal } from "./rational-normal";
import { nerdamerExpand, nerdamerFactor, nerdamerSimplify } from "./nerdamer-bridge";

export { acceptIfEqual } from "./guard";
export { probeEqual, jetify, type ProbeResult } from "./probe";
export { rationalCandidates, rationalNormal } from "./rational-normal";

/** A named simplification strategy: returns its input when it has nothing better, never throws. */
export interface Strategy {
  readonly name: string;
  readonly run: (e: Expr) => Expr;
}

/** The strategies in the order they are tried: our exact rational normal form first, nerdamer after. */
export const STRATEGIES: readonly Strategy[] = [
  { name: "rational", run: rationalNormal },
  { name: "nerdamer-simplify", run: nerdamerSimplify },
  { name: "nerdamer-factor", run: nerdamerFactor },
  { name: "nerdamer-expand", run: nerdamerExpand },
];

export interface Simplified {
  readonly expr: Expr;
  /** The strategy whose verified answer was kept, or null when the input was kept. */
  readonly strategy: string | null;
}

/**
 * Tries each strategy, keeps the smallest answer the guard accepts (smaller
 * than the input and numerically equal to it), else returns the input.
 *
 * @example
 * simplify(readPlainExpr("(r^2 - r_s^2)/(r - r_s)")).expr  // r + r_s
 */
export function simplify(expr: Expr, options: { strategies?: readonly Strategy[]; probe?: ProbeOptions } = {}): Simplified {
  let best: Simplified = { expr, strategy: null };
  for (const strategy of options.strategies ?? STRATEGIES) {
    let candidate: Expr;
    try {
      candidate = strategy.run(expr);
    } catch {
      continue;
    }
    if (exprSize(candidate) >= exprSize(best.expr)) continue;
    if (acceptIfEqual(expr, candidate, options.probe)) best = { expr: candidate, strategy: strategy.name };
  }
  return best;
}
