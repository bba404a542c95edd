import type { Expr } from "../expr/types";

/**
 * The formal leading power of `symbol` in a tree as the symbol grows: 1 for the
 * symbol, sums over products, the larger over sums, n·p for a power. It ignores
 * cancellation between terms, so it is supporting evidence for a limit probe
 * (an upper estimate for sums), never a verdict by itself. Null when a function
 * of the symbol (sin c, exp c) has no power.
 *
 * @example
 * leadingPower(parsePlain("(1 - r_s/r)*c^2"), "c") // 2
 * leadingPower(parsePlain("G*M*L^2/(mu*c^2*r^3)"), "c") // -2
 */
export function leadingPower(e: Expr, symbol: string): number | null {
  switch (e.kind) {
    case "num": case "const": case "dot": case "differential": return 0;
    case "sym": return e.name === symbol ? 1 : 0;
    case "neg": return leadingPower(e.arg, symbol);
    case "add": {
      const ps = e.terms.map((t) => leadingPower(t, symbol));
      return ps.some((p) => p === null) ? null : Math.max(...(ps as number[]));
    }
    case "mul": {
      const ps = e.factors.map((f) => leadingPower(f, symbol));
      return ps.some((p) => p === null) ? null : (ps as number[]).reduce((a, b) => a + b, 0);
    }
    case "div": {
      const n = leadingPower(e.num, symbol);
      const d = leadingPower(e.den, symbol);
      return n === null || d === null ? null : n - d;
    }
    case "pow": {
      const b = leadingPower(e.base, symbol);
      if (e.exp.kind !== "num" && !(e.exp.kind === "neg" && e.exp.arg.kind === "num")) return b === 0 && leadingPower(e.exp, symbol) === 0 ? 0 : null;
      const n = e.exp.kind === "num" ? Number(e.exp.value) : -Number((e.exp.arg as { value: string }).value);
      return b === null ? null : b * n;
    }
    case "call": {
      const ps = e.args.map((a) => leadingPower(a, symbol));
      if (ps.every((p) => p === 0)) return 0;
      if (e.fn === "sqrt" && ps[0] !== null) return ps[0] / 2;
      if (e.fn === "abs") return ps[0];
      return null;
    }
    case "deriv": case "limit": return null;
  }
}
