// Builds SymPy jobs from corpus steps and runs them in one python3 process
// (sympy_check.py). Shared by the SymPy cross-check test and the checker bench.
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import path from "node:path";
import type { Expr, Relation, Statement } from "../../../cas/expr/types";
import { dotVariable } from "../../../cas/expr/types";
import { walkExpr } from "../../../cas/expr/traverse";
import { num } from "../../../cas/expr/build";
import { readCheckRequest } from "../../../cas/check/read";
import { variableOf } from "../../../cas/check/variables";
import type { CorpusStep } from "../check/step-corpus";
import { toSympy } from "./to-sympy";

export interface SympyResult { readonly id: string; readonly verdict: string; readonly ms: number }

const here = path.dirname(fileURLToPath(import.meta.url));

function sides(s: Statement): [Expr, Expr] {
  return s.kind === "relation" ? [s.lhs, s.rhs] : [s, num(0)];
}

/** A job for sympy_check.py, or null for a step the reference does not cover. */
export function sympyJob(step: CorpusStep): Record<string, unknown> | null {
  const { step: parsed, context } = readCheckRequest(step.request);
  const ctx = context.parsed;
  const p = ctx.parameter;
  const src = (e: Expr) => toSympy(e, p);
  const moving = new Set<string>(ctx.coordinates ?? []);
  const statements = [parsed.from, parsed.to, ...ctx.definitions, ...ctx.assumptions].filter((s): s is Statement => s !== null);
  const signed = new Set<string>();
  for (const s of statements) for (const e of s.kind === "relation" ? [s.lhs, s.rhs] : [s]) walkExpr(e, (n) => {
    if (n.kind === "dot" || n.kind === "differential") { moving.add(n.name); signed.add(variableOf(n)!); }
  });
  moving.delete(p);
  const chains = [...moving].map((x) => [x, dotVariable(x, 1), dotVariable(x, 2), dotVariable(x, 3)]);
  const definitions: [string, string][] = [];
  const addDefinition = (r: Relation) => {
    const name = variableOf(r.lhs);
    if (r.op === "=" && name !== null) definitions.push([name, src(r.rhs)]);
  };
  const j = parsed.justification;
  if (j.kind === "substitute") j.relations.forEach(addDefinition);
  ctx.definitions.forEach(addDefinition);
  const fixed: [string, string][] = [];
  const bounds: [string, string][] = [];
  const positive = new Set<string>();
  for (const a of ctx.assumptions) {
    if (a.op === ">" && a.lhs.kind === "sym" && a.rhs.kind === "sym") bounds.push([a.lhs.name, src(a.rhs)]);
    const name = variableOf(a.lhs);
    if (a.op === "=" && name !== null) fixed.push([name, src(a.rhs)]);
    if ((a.op === ">" || a.op === ">=") && name !== null && a.rhs.kind === "num" && Number(a.rhs.value) === 0) positive.add(name);
  }
  const names = new Set<string>();
  for (const s of statements) for (const e of s.kind === "relation" ? [s.lhs, s.rhs] : [s]) walkExpr(e, (n) => { const v = variableOf(n); if (v) names.add(v); });
  for (const d of definitions) names.add(d[0]);
  for (const n of names) if (!signed.has(n)) positive.add(n);
  // Dividing a line element by dτ²: differentials dx become ẋ dτ once a step mixes the two.
  let differentials = false;
  let dots = false;
  for (const s of statements) for (const e of s.kind === "relation" ? [s.lhs, s.rhs] : [s]) walkExpr(e, (n) => { if (n.kind === "differential") differentials = true; if (n.kind === "dot") dots = true; });
  const base = { id: step.id, chains, parameter: p, definitions, fixed, bounds, positive: [...positive], signed: [...signed], link: differentials && dots };
  const to = sides(parsed.to).map(src);
  const from = parsed.from;
  switch (j.kind) {
    case "definition":
      return parsed.to.kind === "relation" ? { ...base, kind: "definition", name: variableOf(parsed.to.lhs), to: to } : null;
    case "euler-lagrange":
      return from ? { ...base, kind: "euler-lagrange", coordinate: j.coordinate, from: [src(from.kind === "relation" ? from.rhs : from)], to } : null;
    case "limit":
      return from ? { ...base, kind: "limit", symbol: j.symbol, from: sides(from).map(src), to } : null;
    case "differentiate": {
      if (!from) return null;
      if (from.kind !== "relation") return { ...base, kind: "expr-equal", from: [`diff(${src(from)}, V('${j.by}'))`], to };
      const name = variableOf(from.lhs);
      if (name === null) return null;
      return { ...base, kind: "identity", definitions: [[name, src(from.rhs)], ...definitions], to };
    }
    default:
      if (!from) return { ...base, kind: "identity", to };
      if (from.kind !== "relation") return { ...base, kind: "expr-equal", from: [src(from)], to };
      return { ...base, kind: "implies", from: sides(from).map(src), to };
  }
}

/** Runs the jobs in one python3 process; each result carries SymPy's own time for its step. */
export function runSympy(jobs: Record<string, unknown>[], timeoutMs = 600_000): SympyResult[] {
  const run = spawnSync("python3", [path.join(here, "sympy_check.py")], { input: jobs.map((j) => JSON.stringify(j)).join("\n") + "\n", encoding: "utf8", timeout: timeoutMs });
  if (run.status !== 0) throw new Error(`python3 failed: ${run.stderr}`);
  return run.stdout.trim().split("\n").filter(Boolean).map((l) => JSON.parse(l) as SympyResult);
}
