import type { Expr, Statement } from "../expr/types";

/**
 * Prints a statement in the plain calculator syntax that `readPlain` reads back
 * to the same tree: explicit `*`, `^`, `name(args)`, and the calculus forms
 * `dot(r)`, `ddot(r)`, `dot(r, 3)`, `d(t)`, `diff(f, r, 2)`, `pdiff(f, r)`,
 * `limit(f, c, infinity)`. Parentheses only where precedence or the tree's
 * grouping needs them. Total: a tree too deep to print gives a marker text.
 *
 * @example
 * toPlain(mul(sub(num(1), div(sym("r_s"), sym("r"))), pow(sym("c"), num(2))))  // "(1 - r_s/r)*c^2"
 */
export function toPlain(s: Statement): string {
  try {
    if (s.kind === "relation") return `${expr(s.lhs, SUM)} ${s.op} ${expr(s.rhs, SUM)}`;
    return expr(s, SUM);
  } catch {
    return "<expression too deep to print>";
  }
}

/** Binding strength of what a position accepts without parentheses. */
const SUM = 0;
const TERM = 1;
const FACTOR = 2;
const POWER = 3;
const ATOM = 4;

function isNegativeLiteral(e: Expr): boolean {
  return e.kind === "num" && e.value.trim().startsWith("-");
}

/** How tightly an expression binds when printed bare. */
function strength(e: Expr): number {
  switch (e.kind) {
    case "add": return SUM;
    case "neg": return TERM;
    case "mul": case "div": return FACTOR;
    case "pow": return POWER;
    case "num": return isNegativeLiteral(e) ? TERM : ATOM;
    default: return ATOM;
  }
}

function wrap(text: string, e: Expr, needed: number): string {
  return strength(e) < needed ? `(${text})` : text;
}

function expr(e: Expr, needed: number): string {
  return wrap(bare(e), e, needed);
}

function bare(e: Expr): string {
  switch (e.kind) {
    case "num": return e.value.trim();
    case "sym": return e.name;
    case "const": return e.name;
    case "add":
      return e.terms
        .map((t, i) => {
          if (t.kind === "neg") return `${i === 0 ? "-" : " - "}${expr(t.arg, TERM + 1)}`;
          const text = t.kind === "add" ? `(${bare(t)})` : expr(t, FACTOR);
          return i === 0 ? text : ` + ${text}`;
        })
        .join("");
    case "neg": return `-${expr(e.arg, TERM + 1)}`;
    case "mul":
      // Keep the tree's grouping: a nested product, or a quotient after the first factor, gets parentheses.
      return e.factors
        .map((f, i) => {
          if (f.kind === "mul" || (f.kind === "div" && i > 0)) return `(${bare(f)})`;
          return f.kind === "div" ? bare(f) : expr(f, POWER);
        })
        .join("*");
    case "div": return `${e.num.kind === "div" ? bare(e.num) : expr(e.num, FACTOR)}/${expr(e.den, POWER)}`;
    case "pow": return `${expr(e.base, ATOM)}^${expr(e.exp, POWER)}`;
    case "call": return `${e.fn}(${e.args.map((a) => expr(a, SUM)).join(", ")})`;
    case "dot":
      if (e.order === 1) return `dot(${e.name})`;
      if (e.order === 2) return `ddot(${e.name})`;
      return `dot(${e.name}, ${e.order})`;
    case "differential": return `d(${e.name})`;
    case "deriv": {
      const fn = e.partial ? "pdiff" : "diff";
      return e.order === 1 ? `${fn}(${expr(e.of, SUM)}, ${e.by})` : `${fn}(${expr(e.of, SUM)}, ${e.by}, ${e.order})`;
    }
    case "limit": return `limit(${expr(e.of, SUM)}, ${e.symbol}, ${expr(e.to, SUM)})`;
  }
}
