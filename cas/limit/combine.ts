import type Decimal from "decimal.js";
import type { DecimalContext } from "../numeric/evaluate";
import type { LimitEstimate, LimitTarget } from "./probe";
import type { LimitEstimateWire, TermFate } from "./protocol";

/** Below this a limit counts as 0: sample points are of order one, so real limits are far larger. */
export const TINY = "1e-30";
/** Two limits are the same when they agree to this relative tolerance (as in the check's limit step). */
export const SAME_RELATIVE = "1e-8";

type Class = "finite" | "zero" | "infinite" | "unclear";

function classOf(D: DecimalContext, e: LimitEstimate): Class {
  if (e.kind === "unclear") return "unclear";
  if (e.kind === "diverges") return "infinite";
  if (e.kind === "vanishes") return "zero";
  return e.value.abs().lte(new D(TINY)) ? "zero" : "finite";
}

/** The finite limit of an estimate (0 for a vanishing one), or null when it diverges or is unclear. */
export function limitValue(D: DecimalContext, e: LimitEstimate): Decimal | null {
  if (e.kind === "converges") return e.value;
  if (e.kind === "vanishes") return new D(0);
  return null;
}

function formatPower(p: number): string {
  return Number.isInteger(p) ? String(p) : String(Math.round(p * 100) / 100);
}

/**
 * LaTeX of the scale a term behaves as: the parameter to a power as it grows,
 * the distance to the target to a power as it approaches a finite value.
 *
 * @example
 * scaleLatex("c", { kind: "infinity" }, -2)            // "c^{-2}"
 * scaleLatex("Q", { kind: "value", value: "0" }, 2)     // "Q^{2}"
 * scaleLatex("r", { kind: "value", value: "2" }, -1)    // "(r - 2)^{-1}"
 */
export function scaleLatex(parameterLatex: string, target: LimitTarget, power: number): string {
  if (target.kind === "infinity" || /^[-+]?0*(\.0*)?$/.test(target.value)) return `${parameterLatex}^{${formatPower(power)}}`;
  const value = target.value.startsWith("-") ? `+ ${target.value.slice(1)}` : `- ${target.value}`;
  return `(${parameterLatex} ${value})^{${formatPower(power)}}`;
}

/**
 * One estimate for an expression from its estimates at every sample point:
 * they must agree in kind (converges, vanishes, diverges), else it is unclear.
 * A converged value is reported at the first point, with whether it is the
 * same everywhere.
 *
 * @example
 * combineEstimates(D, [{ kind: "vanishes", power: -2 }, { kind: "vanishes", power: -2 }], false, (p) => `c^{${p}}`)
 * // { kind: "vanishes", power: -2, like: "c^{-2}" }
 */
export function combineEstimates(D: DecimalContext, estimates: readonly LimitEstimate[], free: boolean, like: (power: number) => string): LimitEstimateWire {
  if (estimates.length === 0) return { kind: "unclear", reason: "no sample point satisfied the assumptions" };
  const unclear = estimates.find((e) => e.kind === "unclear");
  if (unclear?.kind === "unclear") return { kind: "unclear", reason: unclear.reason };
  const classes = new Set(estimates.map((e) => classOf(D, e)));
  if (classes.size > 1) {
    const seen = [...classes].map((c) => (c === "finite" ? "stays finite" : c === "zero" ? "vanishes" : "grows without bound")).join(" at some, ");
    return { kind: "unclear", reason: `it behaves differently at different sample points: ${seen} at others` };
  }
  const [only] = classes;
  if (only === "infinite") {
    const first = estimates[0] as { power: number };
    return { kind: "diverges", power: first.power, like: like(first.power) };
  }
  if (only === "zero") {
    const vanishing = estimates.find((e) => e.kind === "vanishes");
    if (vanishing?.kind === "vanishes") return { kind: "vanishes", power: vanishing.power, like: like(vanishing.power) };
    return { kind: "converges", value: "0", constant: true, free };
  }
  const values = estimates.map((e) => limitValue(D, e)!);
  const first = values[0];
  const tolerance = first.abs().times("1e-9");
  const constant = values.every((v) => v.minus(first).abs().lte(tolerance));
  return { kind: "converges", value: first.toSignificantDigits(12).toString(), constant, free };
}

/** What becomes of a term: a finite non-zero limit remains, a zero one vanishes. */
export function fateOf(e: LimitEstimateWire): TermFate {
  switch (e.kind) {
    case "converges": return e.value === "0" ? "vanishes" : "remains";
    case "vanishes": return "vanishes";
    case "diverges": return "diverges";
    case "unclear": return "unclear";
  }
}

/** A limit in words for a witness: a decimal, 0, or ±∞. */
export function limitText(D: DecimalContext, e: LimitEstimate): string {
  switch (e.kind) {
    case "converges": return e.value.abs().lte(new D(TINY)) ? "0" : e.value.toSignificantDigits(12).toString();
    case "vanishes": return "0";
    case "diverges": return "±∞";
    case "unclear": return `unclear (${e.reason})`;
  }
}
