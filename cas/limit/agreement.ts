import type Decimal from "decimal.js";
import type { DecimalContext } from "../numeric/evaluate";
import type { Point } from "../numeric/sample";
import type { LimitEstimate } from "./probe";
import type { LimitAgreement } from "./protocol";
import { limitText, limitValue, SAME_RELATIVE, TINY } from "./combine";

/** The outcome at one sample point. */
type AtPoint = { readonly kind: "same"; readonly bothGrow?: boolean } | { readonly kind: "differ"; readonly detail: string } | { readonly kind: "unclear"; readonly reason: string };

function close(D: DecimalContext, a: Decimal, b: Decimal): boolean {
  const tiny = new D(TINY);
  if (a.abs().lte(tiny) && b.abs().lte(tiny)) return true;
  return a.minus(b).abs().lte(D.max(a.abs(), b.abs()).times(SAME_RELATIVE));
}

/**
 * Do `a` and `b` tend to the same limit at this point? Finite limits are
 * compared directly; when both grow without bound, their difference must tend
 * to 0.
 */
export function sameLimitAt(D: DecimalContext, a: LimitEstimate, b: LimitEstimate, difference: LimitEstimate, names: readonly [string, string]): AtPoint {
  if (a.kind === "unclear") return { kind: "unclear", reason: `the limit of ${names[0]} is unclear: ${a.reason}` };
  if (b.kind === "unclear") return { kind: "unclear", reason: `the limit of ${names[1]} is unclear: ${b.reason}` };
  const va = limitValue(D, a);
  const vb = limitValue(D, b);
  const differ = () => ({ kind: "differ" as const, detail: `${names[0]} tends to ${limitText(D, a)} and ${names[1]} to ${limitText(D, b)}` });
  if (va && vb) return close(D, va, vb) ? { kind: "same" } : differ();
  if (va || vb) return differ();
  // Both grow without bound: the same thing only if their difference goes to 0.
  if (difference.kind === "unclear") return { kind: "unclear", reason: `both grow without bound and their difference is unclear: ${difference.reason}` };
  const vd = limitValue(D, difference);
  if (vd && vd.abs().lte(new D(TINY))) return { kind: "same", bothGrow: true };
  return { kind: "differ", detail: `both grow without bound, but their difference tends to ${limitText(D, difference)}` };
}

/**
 * Is lim(lhs − rhs) a fixed non-zero multiple of the expected relation's
 * lhs − rhs, so a rearranged or rescaled form passes? `ratio` carries the
 * multiple found at earlier points.
 */
export function proportionalAt(D: DecimalContext, got: LimitEstimate, expected: LimitEstimate, ratio: { value: Decimal | null }): AtPoint {
  if (got.kind === "unclear") return { kind: "unclear", reason: `the limit of lhs − rhs is unclear: ${got.reason}` };
  if (expected.kind === "unclear") return { kind: "unclear", reason: `the expected relation cannot be evaluated: ${expected.reason}` };
  const vg = limitValue(D, got);
  const ve = limitValue(D, expected);
  if (!vg || !ve) return { kind: "unclear", reason: "lhs − rhs grows without bound, so it cannot be compared with the expected relation" };
  const tiny = new D(TINY);
  const zeroG = vg.abs().lte(tiny);
  const zeroE = ve.abs().lte(tiny);
  if (zeroG && zeroE) return { kind: "same" };
  if (zeroG || zeroE) return { kind: "differ", detail: `in the limit lhs − rhs is ${limitText(D, got)} where the expected relation's lhs − rhs is ${limitText(D, expected)}` };
  const k = vg.div(ve);
  if (ratio.value === null) ratio.value = k;
  else if (!close(D, k, ratio.value)) return { kind: "differ", detail: `in the limit lhs − rhs is ${k.toSignificantDigits(8).toString()} times the expected relation's lhs − rhs here, but ${ratio.value.toSignificantDigits(8).toString()} times at the first point` };
  return { kind: "same" };
}

/**
 * The agreement over every sample point: "no" at the first point where they
 * differ (with that point as witness), "unclear" if any point is unclear,
 * else "yes" with `yes` as detail.
 */
export function agreementOver(outcomes: readonly { at: AtPoint; point: Point }[], yes: (bothGrow: boolean) => string): LimitAgreement {
  if (outcomes.length === 0) return { same: "unclear", detail: "no sample point satisfied the assumptions" };
  const differ = outcomes.find((o) => o.at.kind === "differ");
  if (differ && differ.at.kind === "differ") {
    const witness: Record<string, string> = {};
    for (const [name, value] of Object.entries(differ.point).sort(([a], [b]) => a.localeCompare(b))) witness[name] = value.toSignificantDigits(12).toString();
    return { same: "no", detail: `At the sample point below, ${differ.at.detail}.`, witness };
  }
  const unclear = outcomes.find((o) => o.at.kind === "unclear");
  if (unclear && unclear.at.kind === "unclear") return { same: "unclear", detail: `${unclear.at.reason[0].toUpperCase()}${unclear.at.reason.slice(1)}.` };
  return { same: "yes", detail: yes(outcomes.some((o) => o.at.kind === "same" && o.at.bothGrow === true)) };
}
