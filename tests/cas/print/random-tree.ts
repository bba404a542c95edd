import type { Expr } from "@/cas/expr/types";
import { dotVariable } from "@/cas/expr/types";
import { add, call, deriv, differential, div, dot, euler, infinity, limit, mul, neg, num, pi, pow, sym } from "@/cas/expr/build";

/** Deterministic generator (mulberry32) so a failing tree can be rebuilt from its seed. */
export function generator(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const SYMBOLS = ["r", "r_s", "theta", "phi", "varphi", "M", "G", "c", "L", "E", "g_tt", "M_odot", "V_eff", "Lambda", "x", "a_0", "omega_infty", "r_plus", "GM", "g_tphi", "mu"];
const COORDINATES = ["t", "r", "theta", "phi", "tau", "r_s"];
const FUNCTIONS = ["sin", "cos", "tan", "log", "exp", "sqrt", "abs", "tanh", "asin", "sec", "A"];
const NUMBERS = ["0", "1", "2", "3", "12", "0.5", ".25", "6.674e-11", "3e8"];

/** The functions the random trees call that readers must be told about. */
export const DECLARED_FUNCTIONS = ["A"];

/**
 * A random tree in the shapes the readers produce (no one-term sums, no
 * negative literals, no symbols the readers give another meaning such as `e`
 * or `d`), for round-trip tests of the printers.
 */
export function randomTree(next: () => number, depth: number): Expr {
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(next() * xs.length)];
  const leaf = (): Expr => {
    const k = next();
    if (k < 0.45) return sym(pick(SYMBOLS));
    if (k < 0.7) return num(pick(NUMBERS));
    if (k < 0.78) return pick([pi, euler, infinity]);
    if (k < 0.9) return dot(pick(COORDINATES), 1 + Math.floor(next() * 3));
    return differential(pick(COORDINATES));
  };
  if (depth <= 0 || next() < 0.2) return leaf();
  const sub = () => randomTree(next, depth - 1);
  const several = () => Array.from({ length: 2 + Math.floor(next() * 2) }, sub);
  switch (Math.floor(next() * 10)) {
    case 0: return add(...several());
    case 1: return mul(...several());
    case 2: return div(sub(), sub());
    case 3: return pow(sub(), sub());
    case 4: return neg(sub());
    case 5: return call(pick(FUNCTIONS), sub());
    case 6: {
      const by = pick(["r", "tau", "theta", dotVariable("r", 1), "r_s"]);
      return deriv(sub(), by, 1 + Math.floor(next() * 2), next() < 0.5);
    }
    case 7: return limit(sub(), pick(["c", "Q", "r"]), pick([infinity, num(0), sym("r_s")]));
    case 8: return pow(sym(pick(SYMBOLS)), num(pick(["2", "3", "0.5"])));
    default: return mul(num(pick(["2", "3", "0.5"])), sub());
  }
}
