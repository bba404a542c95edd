import type { Expr, Relation, Statement } from "../expr/types";
import { isBuiltinFunction } from "../expr/types";
import { deriv, num, relation } from "../expr/build";
import { exprEquals, freeVariables, mapExpr } from "../expr/traverse";
import type { CheckAnswer } from "./protocol";
import type { RandomStream } from "../numeric/random";
import type { LimitTarget } from "../limit/probe";
import { Undecidable } from "./errors";
import { assertNotCircular, expandContextDefinitions, prepareProblem, type ParsedContext, type PreparedProblem } from "./prepare";
import { DEFAULT_PROBE, probeImplication, type ProbeOutcome, type ProbeSettings } from "./implication";
import { eulerLagrange } from "./euler-lagrange";
import { checkLimitStep } from "./limit-step";
import { mapStatement, variableOf } from "./variables";

/** A justification after reading: names are plain identifiers, relations are trees. */
export type ParsedJustification =
  | { readonly kind: "algebra" }
  | { readonly kind: "substitute"; readonly relations: readonly Relation[] }
  | { readonly kind: "differentiate"; readonly by: string }
  | { readonly kind: "euler-lagrange"; readonly coordinate: string; readonly parameter?: string }
  | { readonly kind: "limit"; readonly symbol: string; readonly to: LimitTarget }
  | { readonly kind: "definition" };

export interface ParsedStep {
  /** Null for a first step (its `to` must then hold on the domain by itself). */
  readonly from: Statement | null;
  readonly to: Statement;
  readonly justification: ParsedJustification;
}

export const PROBABILISTIC_NOTE =
  "A numeric verdict is probabilistic: agreement at random points is strong evidence, not a proof. Symbols were sampled positive and of order one unless the assumptions say otherwise; velocities and differentials took both signs.";

function numericAnswer(outcome: ProbeOutcome, functions: Record<string, string>, settings: ProbeSettings, detail: string): CheckAnswer {
  const substituted = Object.keys(functions).length ? { substitutedFunctions: functions } : {};
  switch (outcome.verdict) {
    case "verified":
      return { verdict: "verified", method: { kind: "numeric", points: outcome.points, digits: outcome.digits, detail: `${detail} ${PROBABILISTIC_NOTE}` }, ...substituted };
    case "refuted":
      return {
        verdict: "refuted",
        method: { kind: "numeric", points: outcome.points, digits: outcome.digits, detail: `${detail} The claim fails at the witness point.` },
        witness: outcome.witness,
        witnessSides: { left: outcome.left, right: outcome.right },
        ...substituted,
      };
    case "undecided":
      return { verdict: "undecided", method: { kind: "numeric", points: 0, digits: settings.digits, detail }, reason: outcome.reason, ...substituted };
  }
}

/** Probes "claim holds wherever `premise` (if any) and the problem's definitions and assumptions hold". */
function implication(problem: PreparedProblem, premise: Statement | null, claim: Statement, rng: RandomStream, settings: ProbeSettings): ProbeOutcome {
  const premises = [...problem.constraints];
  const conditions = [...problem.conditions];
  if (premise && premise.kind === "relation") (premise.op === "=" ? premises : conditions).unshift(premise);
  const claimRelation = claim.kind === "relation" ? claim : relation(claim, "=", num(0));
  return probeImplication({ premises, conditions, fixed: problem.fixed, signed: problem.signed, claim: claimRelation, keep: problem.keep }, rng, settings);
}

/** An expression step `from → to` means equal values; a relation step means `to` follows from `from`. */
function algebraic(problem: PreparedProblem, hasFrom: boolean, rng: RandomStream, settings: ProbeSettings, what: string): CheckAnswer {
  const [from, to] = hasFrom ? problem.statements : [null, problem.statements[0]];
  if (from && from.kind !== "relation" && to.kind !== "relation") {
    return numericAnswer(implication(problem, null, relation(from, "=", to), rng, settings), problem.functions, settings, `${what}: both expressions compared at random points of the domain.`);
  }
  if (from && (from.kind === "relation") !== (to.kind === "relation")) {
    throw new Undecidable("one side of the step is a relation and the other an expression; write both as relations or both as expressions");
  }
  return numericAnswer(implication(problem, from ?? null, to, rng, settings), problem.functions, settings, `${what}: the new relation tested at random points where the previous one${problem.constraints.length ? ", the definitions" : ""} and the assumptions hold.`);
}

/** The defined name of `symbol = …` or `F(x) = …`, or null. */
function definedName(to: Statement): string | null {
  if (to.kind !== "relation" || to.op !== "=") return null;
  const v = variableOf(to.lhs);
  if (v !== null) return v;
  if (to.lhs.kind === "call" && !isBuiltinFunction(to.lhs.fn) && to.lhs.args.every((a) => a.kind === "sym")) return to.lhs.fn;
  return null;
}

function checkDefinition(step: ParsedStep, context: ParsedContext): CheckAnswer {
  const name = definedName(step.to);
  const method = (detail: string) => ({ kind: "symbolic" as const, detail });
  if (name === null || step.to.kind !== "relation") {
    return { verdict: "undecided", method: method("a definition must read `symbol = expression`"), reason: "the step is not of the form symbol = expression" };
  }
  const rhs: Expr = step.to.rhs;
  const used = freeVariables(rhs);
  if (used.has(name)) return { verdict: "refuted", method: method(`the definition of ${name} uses ${name} itself`), reason: `circular: ${name} appears on its own right-hand side` };
  const bindings = new Map<string, Expr>([[name, rhs]]);
  for (const d of context.definitions) {
    const other = definedName(d);
    if (other !== null && other !== name && d.kind === "relation") bindings.set(other, d.rhs);
  }
  try {
    assertNotCircular(bindings);
  } catch (err) {
    return { verdict: "refuted", method: method("the definitions refer to each other in a circle"), reason: err instanceof Error ? err.message : String(err) };
  }
  return { verdict: "verified", method: method(`introduces ${name}: well-formed and not circular (a definition holds by fiat; nothing numeric to check)`) };
}

/**
 * Decides one read step. Throws {@link Undecidable} for steps it cannot
 * decide (callers turn it into an `undecided` answer).
 *
 * @example
 * checkParsedStep({ from: parsePlain("(1-r_s/r)*c^2"), to: parsePlain("c^2 - r_s*c^2/r"), justification: { kind: "algebra" } },
 *   { definitions: [], assumptions: [], parameter: "tau" }, rng)
 * // { verdict: "verified", method: { kind: "numeric", points: 12, digits: 50, … } }
 */
export function checkParsedStep(step: ParsedStep, context: ParsedContext, rng: RandomStream, settings: ProbeSettings = DEFAULT_PROBE): CheckAnswer {
  const j = step.justification;
  const parameter = (j.kind === "euler-lagrange" && j.parameter) || context.parameter;
  const ctx: ParsedContext = { ...context, parameter };
  const from = step.from;
  switch (j.kind) {
    case "definition":
      return checkDefinition(step, ctx);
    case "algebra": {
      if (from && from.kind === "limit") {
        return checkParsedStep({ from: from.of, to: step.to, justification: { kind: "limit", symbol: from.symbol, to: from.to.kind === "const" && from.to.name === "infinity" ? { kind: "infinity" } : { kind: "value", value: constantText(from.to) } } }, ctx, rng, settings);
      }
      const problem = prepareProblem(from ? [from, step.to] : [step.to], ctx, rng);
      return algebraic(problem, from !== null, rng, settings, "algebra");
    }
    case "substitute": {
      if (!from) throw new Undecidable("a substitution needs a previous step");
      const problem = prepareProblem([from, step.to], ctx, rng, j.relations);
      return algebraic(problem, true, rng, settings, `substitution of ${j.relations.length} relation(s)`);
    }
    case "differentiate": {
      if (!from) throw new Undecidable("a differentiation needs a previous step");
      const by = j.by;
      if (from.kind !== "relation") {
        // A relation after an expression states the derivative itself (`d/dr(…) = …`): it must hold identically.
        if (step.to.kind === "relation") return algebraic(prepareProblem([step.to], ctx, rng), false, rng, settings, `derivative by ${by}`);
        return algebraic(prepareProblem([deriv(from, by), step.to], ctx, rng), true, rng, settings, `derivative by ${by}`);
      }
      if (definedName(from) !== null) {
        // `V = …` defines V for this step, so `dV/dr` in the new step means the derivative of its right-hand side.
        if (step.to.kind !== "relation") {
          return algebraic(prepareProblem([deriv(from.rhs, by), step.to], ctx, rng), true, rng, settings, `derivative by ${by}`);
        }
        return algebraic(prepareProblem([step.to], ctx, rng, [from]), false, rng, settings, `derivative by ${by}`);
      }
      const rewritten = from.op === "=" ? derivativeOfSide(step.to, from.lhs, from.rhs, by) : null;
      if (rewritten) {
        // `L^2 = F(r)` gives L² as a function of r, so `d(L^2)/dr` in the new step means F'(r), not 0.
        return algebraic(prepareProblem([rewritten], ctx, rng), false, rng, settings, `derivative by ${by}`);
      }
      const differentiated = relation(deriv(from.lhs, by), from.op, deriv(from.rhs, by));
      return algebraic(prepareProblem([differentiated, step.to], ctx, rng), true, rng, settings, `derivative by ${by} of both sides`);
    }
    case "euler-lagrange": {
      if (!from) throw new Undecidable("an Euler–Lagrange step needs the Lagrangian as the previous step");
      // Defined symbols in L (f = 1 − r_s/r) depend on the coordinates: expand them before ∂L/∂r and d/dτ.
      const lagrangian = expandContextDefinitions(from.kind === "relation" ? from.rhs : from, ctx);
      const el = eulerLagrange(lagrangian, j.coordinate, parameter, context.coordinates ?? []);
      const claim = step.to.kind === "relation" ? step.to : relation(step.to, "=", num(0));
      const problem = prepareProblem([relation(el, "=", num(0)), claim], ctx, rng);
      const [elRelation, claimed] = problem.statements;
      const detail = `Euler–Lagrange equation for ${j.coordinate} (d/d${parameter} ∂L/∂${j.coordinate}̇ − ∂L/∂${j.coordinate} = 0) compared with the claim in both directions, so any non-zero multiple or rearrangement passes.`;
      const forward = implication(problem, elRelation, claimed, rng, settings);
      if (forward.verdict !== "verified") return numericAnswer(forward, problem.functions, settings, detail);
      const backward = implication(problem, claimed, elRelation, rng, settings);
      return numericAnswer(backward, problem.functions, settings, detail);
    }
    case "limit": {
      if (!from) throw new Undecidable("a limit step needs a previous step");
      // The limit symbol is varied on its own (r_Q → 0 with r_Q defined through Q), and the relation
      // the limit is taken of is not rewritten by its own definition (r_ph = … would become r_ph = r_ph).
      const kept = new Set([j.symbol, definedName(from) ?? j.symbol]);
      const limitContext: ParsedContext = { ...ctx, definitions: ctx.definitions.filter((d) => !kept.has(definedName(d) ?? "")) };
      const problem = prepareProblem([from, step.to], limitContext, rng);
      const out = checkLimitStep(problem, j.symbol, j.to, rng);
      if (out.verdict === "undecided") return { verdict: "undecided", method: { kind: "numeric", points: 0, digits: 80, detail: "limit probe (numeric, formal)" }, reason: out.reason };
      if (out.verdict === "refuted") return { verdict: "refuted", method: { kind: "numeric", points: 1, digits: 80, detail: out.detail }, witness: out.witness, witnessSides: { left: out.left, right: out.right } };
      return { verdict: "verified", method: { kind: "numeric", points: out.points, digits: 80, detail: out.detail } };
    }
  }
}

/** `claim` with every d(side)/d(by) replaced by d(value)/d(by), or null when it has none. */
function derivativeOfSide(claim: Statement, side: Expr, value: Expr, by: string): Statement | null {
  let hit = false;
  const replace = (e: Expr) => mapExpr(e, (n) => {
    if (n.kind !== "deriv" || n.by !== by || !exprEquals(n.of, side)) return n;
    hit = true;
    return { ...n, of: value };
  });
  const out = mapStatement(claim, replace);
  return hit ? out : null;
}

function constantText(e: Expr): string {
  if (e.kind === "num") return e.value;
  if (e.kind === "neg" && e.arg.kind === "num") return `-${e.arg.value}`;
  throw new Undecidable("a limit must go to ∞ or to a number");
}
