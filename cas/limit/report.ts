import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { add, neg } from "../expr/build";
import { freeVariables } from "../expr/traverse";
import { decimalContext, evaluateDecimal, type DecimalContext } from "../numeric/evaluate";
import { pointSampler, type Domain, type Point } from "../numeric/sample";
import type { RandomStream } from "../numeric/random";
import { probeLimit, type LimitEstimate, type LimitTarget } from "./probe";
import { leadingPower } from "./leading-power";
import { combineEstimates, fateOf, scaleLatex } from "./combine";
import { agreementOver, proportionalAt, sameLimitAt } from "./agreement";
import type { LimitAgreement, LimitProbeAnswer, LimitSideReport } from "./protocol";

export const PROBE_DIGITS = 80;
export const PROBE_POINTS = 8;

/** A piece of the request as written (for printing) and after the definitions were substituted (for evaluating). */
export interface ProbeItem {
  readonly written: Expr;
  readonly prepared: Expr;
}

export interface ProbeSide {
  readonly side: "left" | "right" | "expression";
  readonly whole: ProbeItem;
  readonly terms: readonly ProbeItem[];
}

export interface LimitProbeProblem {
  /** Plain identifier of the parameter, and its LaTeX for display. */
  readonly parameter: string;
  readonly parameterLatex: string;
  readonly target: LimitTarget;
  readonly sides: readonly ProbeSide[];
  /** For an equation: whether to say if both sides tend to the same thing (not when one side only names the other). */
  readonly compareSides: boolean;
  /** The expected form: an expression for an expression, an equation's lhs − rhs for an equation. */
  readonly expected: { readonly latex: string; readonly prepared: Expr } | null;
  /** Where the other symbols are drawn (the parameter already taken out). */
  readonly domain: Omit<Domain, "variables">;
  readonly notes: readonly string[];
}

/**
 * Splits a sum into its additive terms, distributing a minus over a sum:
 * −(1 − 2M/r + Q²/r²) gives −1, 2M/r, −Q²/r² (as trees: neg(1), neg(neg(…)), …).
 *
 * @example
 * additiveTerms(readLatex("-\\frac{GM}{r} + \\frac{L^2}{2r^2}")) // [−GM/r, L²/(2r²)]
 */
export function additiveTerms(e: Expr): Expr[] {
  if (e.kind === "add") return e.terms.flatMap(additiveTerms);
  if (e.kind === "neg" && e.arg.kind === "add") return e.arg.terms.flatMap(additiveTerms).map((t) => (t.kind === "neg" ? t.arg : neg(t)));
  return [e];
}

function sequenceText(parameter: string, target: LimitTarget): string {
  if (target.kind === "infinity") return `${parameter} = 1.37·10^3, 1.37·10^6, …, 1.37·10^18 (towards ∞)`;
  const base = /^[-+]?0*(\.0*)?$/.test(target.value) ? "" : `${target.value} + `;
  return `${parameter} = ${base}1.37·10^-3, ${base}1.37·10^-6, …, ${base}1.37·10^-18 (towards ${target.value} from above)`;
}

export function formalNote(sequence: string, points: number): string {
  return `A formal, numeric estimate: every expression was evaluated along the finite sequence ${sequence} at ${PROBE_DIGITS} significant digits, at ${points} random point${points === 1 ? "" : "s"} of the other symbols within the assumptions. It shows how the values behave along that sequence; it is not a proof of the limit.`;
}

/**
 * Probes a request's sides, their additive terms and the expected form along
 * the limit sequence at random points of the other symbols, and assembles the
 * answer: each estimate, each term's fate, whether an equation's two sides
 * (or the expression and the expected form) tend to the same thing.
 *
 * @example
 * runLimitProbe(problem, rng, toLatex).sides[0].terms.map((t) => t.fate) // ["remains", "remains", "vanishes"]
 */
export function runLimitProbe(problem: LimitProbeProblem, rng: RandomStream, print: (e: Expr) => string): LimitProbeAnswer {
  const D = decimalContext(PROBE_DIGITS);
  const { parameter, target } = problem;
  const relational = problem.sides.length === 2;
  const difference = relational ? add(problem.sides[0].whole.prepared, neg(problem.sides[1].whole.prepared)) : null;
  const pieces: Expr[] = problem.sides.flatMap((s) => [s.whole.prepared, ...s.terms.map((t) => t.prepared)]);
  if (difference) pieces.push(difference);
  const expectedIndex = problem.expected ? pieces.push(problem.expected.prepared) - 1 : -1;
  const expectedVsExpression = problem.expected && !relational ? pieces.push(add(problem.sides[0].whole.prepared, neg(problem.expected.prepared))) - 1 : -1;
  const involves = pieces.map((p) => freeVariables(p).has(parameter));

  const variables = new Set<string>();
  for (const p of pieces) for (const v of freeVariables(p)) variables.add(v);
  for (const c of problem.domain.conditions) for (const v of freeVariables(c)) variables.add(v);
  variables.delete(parameter);
  const draw = pointSampler(D, { ...problem.domain, variables: [...variables] }, rng);

  const estimates: LimitEstimate[][] = pieces.map(() => []);
  const points: Point[] = [];
  for (let attempt = 0; attempt < PROBE_POINTS * 6 && points.length < PROBE_POINTS; attempt += 1) {
    const point = draw();
    if (!point) continue;
    points.push(point);
    pieces.forEach((piece, i) => estimates[i].push(estimateAt(D, piece, involves[i], point, parameter, target)));
  }

  const like = (power: number) => scaleLatex(problem.parameterLatex, target, power);
  const combined = (i: number) => combineEstimates(D, estimates[i], !involves[i], like);
  let index = 0;
  const sides: LimitSideReport[] = problem.sides.map((side) => {
    const whole = combined(index++);
    const terms = side.terms.map((term) => {
      const estimate = combined(index++);
      const formal = target.kind === "infinity" ? { formalPower: leadingPower(term.prepared, parameter) } : {};
      return { latex: print(term.written), estimate, fate: fateOf(estimate), ...formal };
    });
    const staying = side.terms.filter((_, i) => terms[i].fate !== "vanishes");
    // The side's limit can be written down when what stays does not involve the parameter at all.
    const writable = terms.every((t) => t.fate === "vanishes" || (t.fate === "remains" && t.estimate.kind === "converges" && t.estimate.free));
    const limit = writable ? (staying.length === 0 ? "0" : print(staying.length === 1 ? staying[0].written : add(...staying.map((t) => t.written)))) : undefined;
    return { side: side.side, latex: print(side.whole.written), estimate: whole, terms, ...(limit !== undefined ? { limit } : {}) };
  });

  const differenceIndex = index;
  let relation: LimitAgreement | undefined;
  if (relational && problem.compareSides) {
    relation = agreementOver(points.map((point, p) => ({ point, at: sameLimitAt(D, estimates[0][p], estimates[1 + problem.sides[0].terms.length][p], estimates[differenceIndex][p], ["the left side", "the right side"]) })),
      (bothGrow) => (bothGrow ? "Both sides grow without bound, and their difference tends to 0 at every sample point." : "Both sides tend to the same limit at every sample point."));
  }

  let expected: (LimitAgreement & { latex: string }) | undefined;
  if (problem.expected) {
    const ratio = { value: null as Decimal | null };
    const agreement = relational
      ? agreementOver(points.map((point, p) => ({ point, at: proportionalAt(D, estimates[differenceIndex][p], estimates[expectedIndex][p], ratio) })),
        () => "In the limit, lhs − rhs is a fixed non-zero multiple of the expected relation's lhs − rhs at every sample point.")
      : agreementOver(points.map((point, p) => ({ point, at: sameLimitAt(D, estimates[0][p], estimates[expectedIndex][p], estimates[expectedVsExpression][p], ["the expression", "the expected form"]) })),
        () => "The expression tends to the expected form at every sample point.");
    expected = { latex: problem.expected.latex, ...agreement };
  }

  const allTerms = sides.flatMap((s) => s.terms);
  const notes = [...problem.notes];
  if (!involves.some(Boolean)) notes.push(`${parameter} does not occur in the expression, even through the definitions: every term stays as it is.`);
  if (points.length < PROBE_POINTS) notes.push(`Only ${points.length} of ${PROBE_POINTS} sample points satisfied the assumptions.`);
  const sequence = sequenceText(parameter, target);
  return {
    parameter: problem.parameterLatex,
    target: target.kind === "infinity" ? "infinity" : target.value,
    sequence,
    points: points.length,
    digits: PROBE_DIGITS,
    kind: relational ? "relation" : "expression",
    sides,
    ...(relation ? { relation } : {}),
    ...(expected ? { expected } : {}),
    vanishing: allTerms.filter((t) => t.fate === "vanishes").map((t) => t.latex),
    remaining: allTerms.filter((t) => t.fate === "remains").map((t) => t.latex),
    notes,
    note: formalNote(sequence, points.length),
  };
}

/** The estimate of one piece at one point: its value when the parameter does not occur, else a probe along the sequence. */
function estimateAt(D: DecimalContext, piece: Expr, involves: boolean, point: Point, parameter: string, target: LimitTarget): LimitEstimate {
  if (involves) return probeLimit(D, (s) => evaluateDecimal(D, piece, { values: { ...point, [parameter]: s } }), target);
  try {
    return { kind: "converges", value: evaluateDecimal(D, piece, { values: point }) };
  } catch (err) {
    return { kind: "unclear", reason: `it cannot be evaluated (${err instanceof Error ? err.message : String(err)})` };
  }
}
