import { z } from "zod";
import type { Expr, Statement } from "../expr/types";
import { isBuiltinFunction } from "../expr/types";
import { add, neg, sym } from "../expr/build";
import { freeVariables } from "../expr/traverse";
import { ReadError } from "../parse/errors";
import { normaliseName } from "../parse/options";
import { decimalContext, evaluateDecimal } from "../numeric/evaluate";
import { hashText, randomStream } from "../numeric/random";
import { toLatex } from "../print/latex";
import { readContext, type ReadContext } from "../check/read";
import { prepareProblem } from "../check/prepare";
import { variableOf } from "../check/variables";
import { CasRequestError, Undecidable } from "../check/errors";
import type { CheckContext } from "../check/protocol";
import type { LimitTarget } from "../limit/probe";
import type { LimitProbeAnswer } from "../limit/protocol";
import { additiveTerms, runLimitProbe, type ProbeSide } from "../limit/report";
import { checkContextSchema } from "./check";

const latex = z.string().max(20_000);

/** The `limit` request: a step's context, the expression or equation, the parameter and where it goes. */
export const limitRequestSchema = z.object({
  context: checkContextSchema,
  expression: latex.min(1),
  parameter: z.string().min(1).max(200),
  target: z.string().min(1).max(200),
  expected: latex.min(1).optional(),
  syntax: z.enum(["latex", "plain"]).optional(),
}).strict();

const INFINITY = new Set(["infinity", "\\infty", "+\\infty", "∞", "+∞", "inf"]);

function readParameter(text: string): string {
  try {
    return normaliseName(text.trim());
  } catch (err) {
    if (err instanceof ReadError) throw new CasRequestError("unreadable", `parameter: ${err.message}`, err.position, "parameter");
    throw err;
  }
}

function readTarget(text: string, rc: ReadContext): LimitTarget {
  const t = text.trim();
  if (INFINITY.has(t)) return { kind: "infinity" };
  if (/^-\s*(\\infty|∞|infinity|inf)$/.test(t)) {
    throw new CasRequestError("malformed", "target: the probe goes to +∞ or to a finite value from above; for −∞, probe the expression with the parameter's sign changed", 0, "target");
  }
  const e = rc.read(t, "target");
  const notNumber = () => new CasRequestError("malformed", "target must be infinity (\\infty) or a number such as 0", 0, "target");
  if (e.kind === "relation" || freeVariables(e).size > 0) throw notNumber();
  try {
    const value = evaluateDecimal(decimalContext(40), e, { values: {} });
    if (!value.isFinite()) throw notNumber();
    return { kind: "value", value: value.toString() };
  } catch {
    throw notNumber();
  }
}

/** The name a relation `X = …` or `F(x) = …` defines, or null. */
function definedName(s: Statement | null): string | null {
  if (!s || s.kind !== "relation" || s.op !== "=") return null;
  const v = variableOf(s.lhs);
  if (v !== null) return v;
  if (s.lhs.kind === "call" && !isBuiltinFunction(s.lhs.fn) && s.lhs.args.every((a) => a.kind === "sym")) return s.lhs.fn;
  return null;
}

/** The side of `V = …` that is a bare name occurring nowhere else (nor defined), or null: comparing it with the other side says nothing. */
function nameSide(sides: readonly ProbeSide[], parameter: string): ProbeSide | null {
  for (const [side, other] of [[sides[0], sides[1]], [sides[1], sides[0]]]) {
    const { written, prepared } = side.whole;
    if (written.kind !== "sym" || written.name === parameter || prepared.kind !== "sym" || prepared.name !== written.name) continue;
    if (!freeVariables(other.whole.prepared).has(written.name)) return side;
  }
  return null;
}

function readStatement(text: string, field: string, rc: ReadContext): Statement {
  const s = rc.read(text, field);
  if (s.kind === "relation" && s.op !== "=") throw new CasRequestError("malformed", `${field} must be an expression or an equation (=), not an inequality`, 0, field);
  return s;
}

/**
 * The `limit` verb (limit probe): how an expression or both sides of an
 * equation, and each additive term, behave as the parameter tends to its
 * target, at random points of the other symbols. A formal numeric estimate
 * along a finite sequence, never a proof; the answer's `note` says so.
 *
 * @example
 * runLimit({ context: {}, expression: "-\\frac{GM}{r} + \\frac{L^2}{2r^2} - \\frac{GML^2}{c^2 r^3}", parameter: "c", target: "infinity" })
 * // { sides: [{ terms: [{ fate: "remains" }, { fate: "remains" }, { fate: "vanishes", estimate: { kind: "vanishes", power: -2, like: "c^{-2}" } }], limit: "-\\frac{G M}{r} + \\frac{L^{2}}{2 r^{2}}" }], … }
 */
export function runLimit(input: z.infer<typeof limitRequestSchema>): LimitProbeAnswer {
  const rc = readContext(input.context as CheckContext, input.syntax);
  const parameter = readParameter(input.parameter);
  const target = readTarget(input.target, rc);
  const statement = readStatement(input.expression, "expression", rc);
  const expected = input.expected ? readStatement(input.expected, "expected", rc) : null;
  if (expected && (expected.kind === "relation") !== (statement.kind === "relation")) {
    throw new CasRequestError("malformed", statement.kind === "relation"
      ? "expected must be an equation when the expression is one (or leave it out to compare the two sides)"
      : "expected must be an expression when the probed expression is not an equation", 0, "expected");
  }

  const wholes: [ProbeSide["side"], Expr][] = statement.kind === "relation" ? [["left", statement.lhs], ["right", statement.rhs]] : [["expression", statement]];
  const terms = wholes.map(([, e]) => additiveTerms(e));
  const given: Statement[] = [...wholes.map(([, e]) => e), ...terms.flat(), ...(expected ? [expected] : [])];
  // As in the check's limit step: the parameter is varied on its own (not replaced by a
  // definition of it), and a relation is not rewritten by its own definition (V = … into V = V).
  const kept = new Set([parameter, definedName(statement), definedName(expected)].filter((n): n is string => n !== null));
  const context = { ...rc.parsed, definitions: rc.parsed.definitions.filter((d) => !kept.has(definedName(d) ?? "")) };
  const rng = randomStream(hashText(JSON.stringify(input)));
  let problem;
  try {
    problem = prepareProblem(given, context, rng);
  } catch (err) {
    if (err instanceof Undecidable) throw new CasRequestError("malformed", `cannot probe this request: ${err.message}`);
    throw err;
  }

  const prepared = problem.statements as Expr[];
  let at = wholes.length;
  const sides: ProbeSide[] = wholes.map(([side, written], i) => ({
    side,
    whole: { written, prepared: prepared[i] },
    terms: terms[i].map((t) => ({ written: t, prepared: prepared[at++] })),
  }));
  const preparedExpected = expected ? problem.statements[at] : null;
  const expectedExpr = preparedExpected === null ? null
    : preparedExpected.kind === "relation" ? add(preparedExpected.lhs, neg(preparedExpected.rhs)) : preparedExpected;

  const mentions = (e: Statement | Expr) => freeVariables(e).has(parameter);
  const notes: string[] = [];
  if (problem.constraints.length) notes.push(`Definitions not of the form symbol = … were not used: ${problem.constraints.map((c) => toLatex(c)).join("; ")}.`);
  const named = sides.length === 2 ? nameSide(sides, parameter) : null;
  if (named) notes.push(`The ${named.side} side, ${toLatex(named.whole.written)}, only names the other side (it occurs nowhere else), so the two sides are not compared: the name tends to whatever the other side tends to.`);
  return runLimitProbe({
    parameter,
    parameterLatex: toLatex(sym(parameter)),
    target,
    sides,
    compareSides: named === null,
    expected: expected && expectedExpr ? { latex: toLatex(expected), prepared: expectedExpr } : null,
    domain: {
      fixed: problem.fixed.filter((f) => f.variable !== parameter && !mentions(f.value)),
      conditions: problem.conditions.filter((c) => !mentions(c)),
      signed: problem.signed,
    },
    notes,
  }, rng, (e) => toLatex(e));
}
