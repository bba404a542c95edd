// Prints a Vierbein expression tree as SymPy source for sympy_check.py. The
// helpers V (symbol), F (undetermined function), TD (total derivative by the
// curve parameter) and R (exact rational) are defined there.
import type { Expr } from "../../../cas/expr/types";
import { differentialVariable, dotVariable, isBuiltinFunction } from "../../../cas/expr/types";

const FUNCTIONS: Record<string, string> = { abs: "Abs" };

export function toSympy(e: Expr, parameter: string): string {
  const rec = (x: Expr) => toSympy(x, parameter);
  switch (e.kind) {
    case "num": return `R('${e.value}')`;
    case "sym": return `V('${e.name}')`;
    case "dot": return `V('${dotVariable(e.name, e.order)}')`;
    case "differential": return `V('${differentialVariable(e.name)}')`;
    case "const": return e.name === "pi" ? "pi" : e.name === "e" ? "E" : "oo";
    case "add": return `(${e.terms.map(rec).join(" + ")})`;
    case "mul": return `(${e.factors.map(rec).join("*")})`;
    case "div": return `(${rec(e.num)}/${rec(e.den)})`;
    case "pow": return `(${rec(e.base)}**${rec(e.exp)})`;
    case "neg": return `(-${rec(e.arg)})`;
    case "call": return isBuiltinFunction(e.fn) ? `${FUNCTIONS[e.fn] ?? e.fn}(${e.args.map(rec).join(", ")})` : `F('${e.fn}')(${e.args.map(rec).join(", ")})`;
    case "deriv": {
      let out = rec(e.of);
      for (let i = 0; i < e.order; i += 1) out = e.by === parameter ? `TD(${out})` : `diff(${out}, V('${e.by}'))`;
      return out;
    }
    case "limit": return `limit(${rec(e.of)}, V('${e.symbol}'), ${rec(e.to)})`;
  }
}
