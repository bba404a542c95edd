import type Decimal from "decimal.js";
import type { Expr, Statement } from "../expr/types";
import { freeVariables } from "../expr/traverse";
import { add, neg } from "../expr/build";
import { decimalContext, evaluateDecimal } from "../numeric/evaluate";
import { pointSampler } from "../numeric/sample";
import type { RandomStream } from "../numeric/random";
import { probeLimit, type LimitEstimate, type LimitTarget } from "../limit/probe";
import { leadingPower } from "../limit/leading-power";
import type { PreparedProblem } from "./prepare";

export const LIMIT_DIGITS = 80;
export const LIMIT_POINTS = 8;

export type LimitOutcome =
  | { verdict: "verified"; points: number; detail: string }
  | { verdict: "refuted"; witness: Record<string, string>; left: string; right: string; detail: string }
  | { verdict: "undecided"; reason: string };

const asDifference = (s: Statement): Expr => (s.kind === "relation" ? add(s.lhs, neg(s.rhs)) : s);

function describe(e: LimitEstimate): string {
  switch (e.kind) {
    case "converges": return e.value.toSignificantDigits(12).toString();
    case "vanishes": return "0";
    case "diverges": return "±∞";
    case "unclear": return `unclear (${e.reason})`;
  }
}

/**
 * Checks "`to` is the limit of `from` as `symbol` → target" at random points
 * of the other variables. For expressions the two limits must agree; for
 * relations lim(lhs − rhs) of `from` must be a fixed non-zero multiple of
 * lhs − rhs of `to` (so rearranged or rescaled Newtonian forms pass). The
 * limit itself comes from {@link probeLimit}: a numeric, formal check.
 *
 * @example
 * checkLimitStep(prepared, "c", { kind: "infinity" }, rng) // { verdict: "verified", … }
 */
export function checkLimitStep(problem: PreparedProblem, symbol: string, target: LimitTarget, rng: RandomStream): LimitOutcome {
  if (problem.constraints.length > 0) return { verdict: "undecided", reason: "a limit step cannot use definitions that are not of the form symbol = …" };
  const [from, to] = problem.statements;
  const relational = from.kind === "relation" || to.kind === "relation";
  if (relational && (from.kind !== "relation" || to.kind !== "relation" || from.op !== "=" || to.op !== "=")) {
    return { verdict: "undecided", reason: "a limit step takes two expressions or two equations" };
  }
  const F = asDifference(from);
  const T = asDifference(to);
  const D = decimalContext(LIMIT_DIGITS);
  const variables = new Set<string>([...freeVariables(F), ...freeVariables(T)]);
  variables.delete(symbol);
  const conditions = problem.conditions.filter((c) => !freeVariables(c).has(symbol));
  const fixed = problem.fixed.filter((f) => f.variable !== symbol && !freeVariables(f.value).has(symbol));
  for (const c of conditions) for (const v of freeVariables(c)) variables.add(v);
  const draw = pointSampler(D, { variables: [...variables], fixed, conditions, signed: problem.signed }, rng);
  const power = leadingPower(F, symbol);
  const detail = `limit probe along ${symbol} → ${target.kind === "infinity" ? "∞ (1.37·10^3 … 1.37·10^18)" : `${target.value} from above`} at ${LIMIT_DIGITS} digits${power === null ? "" : `; formal leading power of ${symbol} in the previous step at most ${power} (ignoring cancellation)`}. A numeric, formal check: it shows the values approach each other, not a proof of the limit.`;

  let ratio: Decimal | null = null;
  let found = 0;
  for (let attempt = 0; attempt < LIMIT_POINTS * 6 && found < LIMIT_POINTS; attempt += 1) {
    const point = draw();
    if (!point) continue;
    const along = (e: Expr) => probeLimit(D, (s) => evaluateDecimal(D, e, { values: { ...point, [symbol]: s } }), target);
    const a = along(F);
    const b = freeVariables(T).has(symbol) ? along(T) : safeValue(() => evaluateDecimal(D, T, { values: point }));
    if (a.kind === "unclear") return { verdict: "undecided", reason: `the limit of the previous step is unclear: ${a.reason}` };
    if (b.kind === "unclear") return { verdict: "undecided", reason: `the claimed limit cannot be evaluated: ${b.reason}` };
    const tiny = new D(10).pow(-30);
    const valueOf = (e: LimitEstimate) => (e.kind === "converges" ? e.value : e.kind === "vanishes" ? new D(0) : null);
    const va = valueOf(a);
    const vb = valueOf(b);
    const witness = () => {
      const w: Record<string, string> = {};
      for (const v of [...variables].sort()) if (point[v]) w[v] = point[v].toSignificantDigits(20).toString();
      return { verdict: "refuted" as const, witness: w, left: describe(a), right: describe(b), detail };
    };
    if (va === null || vb === null) {
      if (a.kind === "diverges" && b.kind === "diverges") return { verdict: "undecided", reason: "both sides grow without bound" };
      return witness();
    }
    const bothZero = va.abs().lte(tiny) && vb.abs().lte(tiny);
    if (!relational) {
      if (!bothZero && va.minus(vb).abs().gt(D.max(va.abs(), vb.abs()).times(1e-8))) return witness();
    } else if (!bothZero) {
      if (vb.abs().lte(tiny) || va.abs().lte(tiny)) return witness();
      const k = va.div(vb);
      if (ratio === null) ratio = k;
      else if (k.minus(ratio).abs().gt(ratio.abs().times(1e-8))) return witness();
    }
    found += 1;
  }
  if (found < LIMIT_POINTS) return { verdict: "undecided", reason: `only ${found} of ${LIMIT_POINTS} sample points satisfied the assumptions` };
  return { verdict: "verified", points: found, detail };
}

function safeValue(f: () => Decimal): LimitEstimate {
  try {
    return { kind: "converges", value: f() };
  } catch (err) {
    return { kind: "unclear", reason: err instanceof Error ? err.message : String(err) };
  }
}
