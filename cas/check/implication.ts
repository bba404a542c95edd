import type Decimal from "decimal.js";
import type { Expr, Relation } from "../expr/types";
import { freeVariables } from "../expr/traverse";
import { add, neg } from "../expr/build";
import { differentiate } from "../calculus/differentiate";
import { polynomialDegree } from "./degree";
import { decimalContext, evaluateDecimal, type DecimalContext } from "../numeric/evaluate";
import { conditionHolds, pointSampler, type Point } from "../numeric/sample";
import { solveFor } from "../numeric/solve";
import { clearDifference, relativeSize, zeroTolerance } from "../numeric/residual";
import { claimResidual } from "./magnitude";
import type { RandomStream } from "../numeric/random";

/** How hard the probe looks: `points` sample points at `digits` significant digits. */
export interface ProbeSettings {
  readonly digits: number;
  readonly points: number;
}

export const DEFAULT_PROBE: ProbeSettings = { digits: 40, points: 12 };

/** A claim to test on the set where the premises and conditions hold. */
export interface ImplicationProblem {
  /** Equalities every sample point must satisfy; each is solved numerically for one of its variables. */
  readonly premises: readonly Relation[];
  /** Inequalities every sample point must satisfy (assumptions, an inequality `from`). */
  readonly conditions: readonly Relation[];
  readonly fixed: readonly { variable: string; value: Expr }[];
  readonly signed: ReadonlySet<string>;
  readonly claim: Relation;
  /** Variables never solved for: the parameter's differential dτ (dividing by dτ² presumes dτ ≠ 0, and dτ = 0 would solve any line element). */
  readonly keep?: ReadonlySet<string>;
}

export type ProbeOutcome =
  | { readonly verdict: "verified"; readonly points: number; readonly digits: number }
  | { readonly verdict: "refuted"; readonly witness: Record<string, string>; readonly left: string; readonly right: string; readonly points: number; readonly digits: number }
  | { readonly verdict: "undecided"; readonly reason: string };

interface Plan { variable: string; derivative: Expr; degree: number | null }

/** Which variable to solve each premise for: velocities and differentials first (they are free along a curve), then variables no condition bounds. */
function candidateVariables(problem: ImplicationProblem): string[][] {
  const fixed = new Set(problem.fixed.map((f) => f.variable));
  const bounded = new Set<string>();
  for (const c of problem.conditions) for (const v of freeVariables(c)) bounded.add(v);
  const taken = new Set<string>();
  return problem.premises.map((p) => {
    const mine = [...freeVariables(p)].filter((v) => !fixed.has(v) && !taken.has(v) && !problem.keep?.has(v));
    const difference = add(p.lhs, neg(p.rhs));
    const score = new Map(mine.map((v) => [v, rank(v) + degreePenalty(polynomialDegree(difference, v))]));
    mine.sort((a, b) => score.get(a)! - score.get(b)!);
    for (const v of freeVariables(p)) taken.add(v);
    return mine;
  });
  function rank(v: string): number {
    return (problem.signed.has(v) ? 0 : 2) + (bounded.has(v) ? 1 : 0);
  }
  // A closed-form root (degree 1 or 2) beats everything else; Newton on a rational function is the last resort.
  function degreePenalty(d: number | null): number {
    return d === 1 ? 0 : d === 2 ? 4 : 8;
  }
}

function show(x: Decimal): string {
  return x.toSignificantDigits(20).toString();
}

/**
 * Tests whether `claim` holds at random points where every premise and
 * condition holds: each point is drawn from the domain, then each premise is
 * solved for one variable by Newton's method. Refuted at the first point where
 * the claim clearly fails (relative difference above 10^-20), with that point as
 * the witness; verified when it holds at `points` points to the working
 * precision; undecided otherwise, with the reason. Probabilistic by nature: a
 * verified claim is strong evidence, not a proof.
 *
 * @example
 * probeImplication({ premises: [x = 2y], conditions: [], fixed: [], signed: new Set(), claim: x/2 = y }, rng)
 * // { verdict: "verified", points: 12, digits: 50 }
 */
export function probeImplication(problem: ImplicationProblem, rng: RandomStream, settings: ProbeSettings = DEFAULT_PROBE): ProbeOutcome {
  const D: DecimalContext = decimalContext(settings.digits);
  const variables = new Set<string>();
  for (const s of [...problem.premises, ...problem.conditions, problem.claim]) for (const v of freeVariables(s)) variables.add(v);
  for (const f of problem.fixed) for (const v of freeVariables(f.value)) variables.add(v);
  const fixedHere = problem.fixed.filter((f) => variables.has(f.variable));
  const draw = pointSampler(D, { variables: [...variables], fixed: fixedHere, conditions: problem.conditions, signed: problem.signed }, rng);

  const candidates = candidateVariables(problem);
  const missing = candidates.findIndex((c) => c.length === 0);
  if (missing >= 0) return { verdict: "undecided", reason: "the relations to satisfy share all their variables, so they cannot be solved one after another" };
  const plans: Plan[][] = [];
  const alternatives = Math.min(3, Math.max(...candidates.map((c) => c.length), 1));
  for (let k = 0; k < alternatives; k += 1) {
    plans.push(problem.premises.map((p, i) => {
      const v = candidates[i][Math.min(k, candidates[i].length - 1)];
      const difference = add(p.lhs, neg(p.rhs));
      return { variable: v, derivative: differentiate(difference, v), degree: polynomialDegree(difference, v) };
    }));
  }

  const tolerance = zeroTolerance(D);
  const clear = clearDifference(D);
  let found = 0;
  let unclear = 0;
  let evaluationFailure: string | null = null;
  const budget = settings.points * 12;
  // Plans take turns after a failed solve, so a variable with no real root at most points (dτ² = −…) does not eat the budget.
  for (let attempt = 0, plan = 0; attempt < budget && found < settings.points; attempt += 1) {
    let point: Point | null = draw();
    if (!point) continue;
    for (let i = 0; i < problem.premises.length && point; i += 1) {
      const p = problem.premises[i];
      point = solveFor(D, p.lhs, p.rhs, plans[plan][i].derivative, plans[plan][i].variable, point, plans[plan][i].degree);
    }
    if (!point) {
      plan = (plan + 1) % plans.length;
      continue;
    }
    const here = snapRoundingZeros(D, problem.premises, plans[plan], point);
    if (!problem.conditions.every((c) => conditionHolds(D, c, here))) continue;
    let size: Decimal;
    try {
      const r = claimResidual(D, problem.claim.lhs, problem.claim.rhs, here);
      size = relativeSize(r);
      if (problem.claim.op !== "=" && problem.claim.op !== "!=") size = r.scale.isZero() ? r.value : r.value.div(r.scale);
    } catch (err) {
      evaluationFailure = err instanceof Error ? err.message : String(err);
      continue;
    }
    const verdict = classify(problem.claim.op, size, tolerance, clear);
    if (verdict === "fails") {
      const witness: Record<string, string> = {};
      for (const v of [...variables].sort()) if (here[v]) witness[v] = show(here[v]);
      const side = (e: Expr) => {
        try { return show(evaluateDecimal(D, e, { values: here })); } catch (err) { return err instanceof Error ? err.message : String(err); }
      };
      return { verdict: "refuted", witness, left: side(problem.claim.lhs), right: side(problem.claim.rhs), points: found + 1, digits: settings.digits };
    }
    if (verdict === "unclear") unclear += 1;
    else found += 1;
  }
  if (found >= settings.points) return { verdict: "verified", points: found, digits: settings.digits };
  if (unclear > 0) return { verdict: "undecided", reason: `the two sides agree only to within rounding at ${unclear} point(s); the precision is not enough to decide` };
  if (found === 0 && evaluationFailure) return { verdict: "undecided", reason: `evaluation failed at every sample point (${evaluationFailure})` };
  if (found === 0) return { verdict: "undecided", reason: "no sample point satisfied the assumptions and the previous step" };
  return { verdict: "undecided", reason: `only ${found} of ${settings.points} sample points satisfied the assumptions and the previous step` };
}

/**
 * A premise that holds at v = 0 up to rounding, solved to a tiny v, means v = 0: at
 * r = (3GM/Λc²)^{1/3} the premise L² = μ²r²(GM − Λc²r³/3)/(…) gives L ≈ 10^-19 from a
 * cancellation at 10^-40, and the claim L² = 0 would look false relative to L² itself.
 * Only a variable forced tiny by cancellation is snapped; a premise such as L² = 10^-30
 * fails at L = 0 relative to its own terms and keeps its root.
 */
function snapRoundingZeros(D: DecimalContext, premises: readonly Relation[], plan: readonly Plan[], point: Point): Point {
  const tiny = new D(10).pow(-Math.floor(D.precision / 4));
  const tolerance = zeroTolerance(D);
  let out = point;
  premises.forEach((p, i) => {
    const v = plan[i].variable;
    if (!out[v] || out[v].isZero() || out[v].abs().gt(tiny)) return;
    const atZero = { ...out, [v]: new D(0) };
    try {
      if (relativeSize(claimResidual(D, p.lhs, p.rhs, atZero)).lte(tolerance)) out = atZero;
    } catch {
      /* keep the root */
    }
  });
  return out;
}

/** For "=": the relative size of lhs − rhs; for inequalities: the signed relative size of lhs − rhs. */
function classify(op: Relation["op"], size: Decimal, tolerance: Decimal, clear: Decimal): "holds" | "fails" | "unclear" {
  switch (op) {
    case "=":
      return size.lte(tolerance) ? "holds" : size.gte(clear) ? "fails" : "unclear";
    case "!=":
      return size.gte(clear) ? "holds" : size.lte(tolerance) ? "fails" : "unclear";
    case ">": case ">=":
      return size.gt(tolerance.neg()) ? (op === ">" && size.abs().lte(tolerance) ? "unclear" : "holds") : size.lt(clear.neg()) ? "fails" : "unclear";
    case "<": case "<=":
      return size.lt(tolerance) ? (op === "<" && size.abs().lte(tolerance) ? "unclear" : "holds") : size.gt(clear) ? "fails" : "unclear";
  }
}
