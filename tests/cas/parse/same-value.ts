import type { Expr, Statement } from "@/cas/expr/types";
import { exprEquals, freeVariables, functionNames } from "@/cas/expr/traverse";
import { evaluateFloat, EvaluationError } from "@/cas/numeric/evaluate";
import { isBuiltinFunction } from "@/cas/expr/types";

/** A small deterministic generator (mulberry32), so a failing point can be reproduced. */
function generator(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function functionsOf(es: readonly Expr[]): Record<string, (args: number[]) => number> {
  const out: Record<string, (args: number[]) => number> = {};
  for (const e of es) {
    for (const fn of functionNames(e)) {
      if (!isBuiltinFunction(fn)) out[fn] = (args) => 1.3 + 0.7 * Math.sin(args.reduce((s, x, i) => s + (i + 1) * x, 0));
    }
  }
  return out;
}

/**
 * Whether two trees are the same (structurally) or take the same value at
 * random points (each variable in [0.2, 2.2], points where either side is
 * undefined are skipped). Throws when too few points evaluate, so the test
 * cannot pass vacuously.
 */
export function sameValue(a: Statement, b: Statement, points = 6): boolean {
  if (a.kind === "relation" || b.kind === "relation") {
    if (a.kind !== "relation" || b.kind !== "relation" || a.op !== b.op) return false;
    return sameValue(a.lhs, b.lhs, points) && sameValue(a.rhs, b.rhs, points);
  }
  if (exprEquals(a, b)) return true;
  const names = [...new Set([...freeVariables(a), ...freeVariables(b)])].sort();
  const functions = functionsOf([a, b]);
  const next = generator(20240611);
  let tried = 0;
  let evaluated = 0;
  while (evaluated < points && tried < points * 20) {
    tried += 1;
    const values: Record<string, number> = {};
    for (const n of names) values[n] = 0.2 + 2 * next();
    let x: number;
    let y: number;
    try {
      x = evaluateFloat(a, { values, functions });
      y = evaluateFloat(b, { values, functions });
    } catch (e) {
      if (e instanceof EvaluationError) continue;
      throw e;
    }
    evaluated += 1;
    if (Math.abs(x - y) > 1e-9 * Math.max(1, Math.abs(x), Math.abs(y))) return false;
  }
  if (evaluated < points) throw new Error(`only ${evaluated} of ${points} points evaluate; compare these trees structurally`);
  return true;
}
