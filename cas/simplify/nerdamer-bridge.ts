import nerdamer from "nerdamer";
import "nerdamer/Algebra";
import "nerdamer/Calculus";
import type { Expr } from "../expr/types";
import { isBuiltinFunction } from "../expr/types";
import { exprSize, substitute, walkExpr } from "../expr/traverse";
import { readPlainExpr } from "../parse/plain";

/**
 * The only door to nerdamer in the repository. A tree goes out as a nerdamer
 * string with every symbol renamed v0, v1, … (so no user symbol collides with
 * nerdamer's e, pi or function names) and every node nerdamer cannot hold
 * (ṙ, dr, A(r), A'(r)) stood in for by a fresh symbol; the answer comes back
 * through the plain reader and the stand-ins are put back.
 *
 * nerdamer's simplify is known to be wrong on some rational expressions, so
 * nothing here is trusted: callers pass results through the guard.
 */

type Operation = "simplify" | "factor" | "expand";

class Outgoing {
  private readonly names = new Map<string, string>();
  readonly back: Record<string, Expr> = {};

  private standIn(key: string, e: Expr): string {
    let name = this.names.get(key);
    if (name === undefined) {
      name = `v${this.names.size}`;
      this.names.set(key, name);
      this.back[name] = e;
    }
    return name;
  }

  write(e: Expr): string {
    switch (e.kind) {
      case "num": return e.value.includes("e") || e.value.includes("E") ? `(${Number(e.value)})` : e.value;
      case "const": if (e.name === "infinity") throw new Error("∞"); return e.name;
      case "sym": return this.standIn(`s:${e.name}`, e);
      case "add": return `(${e.terms.map((t) => this.write(t)).join("+")})`;
      case "mul": return `(${e.factors.map((f) => this.write(f)).join("*")})`;
      case "div": return `(${this.write(e.num)}/${this.write(e.den)})`;
      case "pow": return `(${this.write(e.base)})^(${this.write(e.exp)})`;
      case "neg": return `(-${this.write(e.arg)})`;
      case "call":
        if (isBuiltinFunction(e.fn)) return `${e.fn}(${e.args.map((a) => this.write(a)).join(",")})`;
        return this.standIn(`x:${JSON.stringify(e)}`, e);
      default:
        return this.standIn(`x:${JSON.stringify(e)}`, e);
    }
  }
}

/**
 * Runs one nerdamer operation on a tree and reads the answer back; returns the
 * input unchanged when nerdamer fails or the answer does not read back.
 *
 * @example
 * viaNerdamer(readPlainExpr("(r^2-1)/(r-1)"), "simplify")  // r + 1 (unverified!)
 */
export function viaNerdamer(expr: Expr, operation: Operation): Expr {
  if (tooBigForNerdamer(expr)) return expr;
  try {
    const out = new Outgoing();
    const text = out.write(expr);
    const answer = nerdamer(`${operation}(${text})`).toString();
    const read = readPlainExpr(answer);
    return substitute(read, out.back);
  } catch {
    return expr;
  }
}

/** nerdamer has no time limit of its own: refuse what could make it expand for ever, (x+1)^100000. */
const MAX_NODES = 4000;
const MAX_POWER = 32;
function tooBigForNerdamer(expr: Expr): boolean {
  if (exprSize(expr) > MAX_NODES) return true;
  let big = false;
  walkExpr(expr, (n) => {
    if (n.kind === "pow" && n.exp.kind === "num" && Math.abs(Number(n.exp.value)) > MAX_POWER) big = true;
  });
  return big;
}

const smallerOr = (expr: Expr, candidate: Expr) => (exprSize(candidate) < exprSize(expr) ? candidate : expr);

/** Strategy: nerdamer's simplify, when smaller (unverified: pass through the guard). */
export const nerdamerSimplify = (expr: Expr): Expr => smallerOr(expr, viaNerdamer(expr, "simplify"));
/** Strategy: nerdamer's factor, when smaller (unverified: pass through the guard). */
export const nerdamerFactor = (expr: Expr): Expr => smallerOr(expr, viaNerdamer(expr, "factor"));
/** Strategy: nerdamer's expand, when smaller (unverified: pass through the guard). */
export const nerdamerExpand = (expr: Expr): Expr => smallerOr(expr, viaNerdamer(expr, "expand"));

