import type { Statement } from "../expr/types";
import { walkExpr } from "../expr/traverse";
import { CasRequestError } from "./errors";

/** Largest integer exponent the checker accepts: (x+1)^100000 is refused before any work. */
export const MAX_EXPONENT = 1000;
/** Largest tree (in nodes) of one statement. */
export const MAX_NODES = 5000;

/**
 * Refuses trees whose size would make a check slow or memory-hungry, with a
 * clear message naming the request field. The readers already cap source
 * length and nesting depth.
 *
 * @example
 * guardStatement(readPlain("(x+1)^100000"), "to") // throws CasRequestError("too_large", …)
 */
export function guardStatement(s: Statement, field: string): void {
  let nodes = 0;
  const visit = (e: Parameters<Parameters<typeof walkExpr>[1]>[0]) => {
    nodes += 1;
    if (nodes > MAX_NODES) throw new CasRequestError("too_large", `${field} has more than ${MAX_NODES} parts; split the step`, undefined, field);
    if (e.kind === "pow" && e.exp.kind === "num" && Math.abs(Number(e.exp.value)) > MAX_EXPONENT) {
      throw new CasRequestError("too_large", `${field} raises to the power ${e.exp.value}; exponents above ${MAX_EXPONENT} are refused`, undefined, field);
    }
    if (e.kind === "deriv" && e.order > 20) throw new CasRequestError("too_large", `${field} takes a derivative of order ${e.order}; at most 20`, undefined, field);
  };
  if (s.kind === "relation") { walkExpr(s.lhs, visit); walkExpr(s.rhs, visit); }
  else walkExpr(s, visit);
}
