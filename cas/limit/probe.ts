import type Decimal from "decimal.js";
import type { DecimalContext } from "../numeric/evaluate";

/** Where the parameter goes: to infinity, or to a finite value (approached from above). */
export type LimitTarget = { readonly kind: "infinity" } | { readonly kind: "value"; readonly value: string };

/** What the sequence of values suggests. Formal: a finite sequence never proves a limit. */
export type LimitEstimate =
  | { readonly kind: "converges"; readonly value: Decimal }
  | { readonly kind: "vanishes"; readonly power: number }
  | { readonly kind: "diverges"; readonly power: number }
  | { readonly kind: "unclear"; readonly reason: string };

/** The parameter values the probe walks through: 1.37·10^3k towards infinity, or a + 1.37·10^−3k towards a. */
export function limitSequence(D: DecimalContext, target: LimitTarget, steps = 6): Decimal[] {
  const out: Decimal[] = [];
  for (let k = 1; k <= steps; k += 1) {
    const scale = new D(10).pow(3 * k);
    out.push(target.kind === "infinity" ? scale.times("1.37") : new D(target.value).plus(new D("1.37").div(scale)));
  }
  return out;
}

/**
 * Estimates lim f(s) along {@link limitSequence}: a value that settles to
 * 10^−9 relative, a value shrinking by at least 100× per step (vanishes, with
 * the apparent power of the parameter), a value growing by 100× per step
 * (diverges), or unclear (oscillation, evaluation failures). Use a context with
 * enough digits that 10^18-sized terms still cancel exactly (80 is ample).
 *
 * @example
 * probeLimit(D, (c) => c.pow(-2).plus(3), { kind: "infinity" }) // { kind: "converges", value: 3.000… }
 */
export function probeLimit(D: DecimalContext, f: (s: Decimal) => Decimal, target: LimitTarget): LimitEstimate {
  const sequence = limitSequence(D, target);
  const values: Decimal[] = [];
  for (const s of sequence) {
    try {
      values.push(f(s));
    } catch (err) {
      return { kind: "unclear", reason: `evaluation failed along the sequence (${err instanceof Error ? err.message : String(err)})` };
    }
  }
  const [v4, v5, v6] = values.slice(-3);
  const hundred = new D(100);
  const stepSize = new D(10).pow(3);
  const apparentPower = () => {
    if (v5.isZero() || v6.isZero()) return 0;
    const ratio = v6.abs().div(v5.abs());
    const p = ratio.log(10).div(stepSize.log(10)).toNumber();
    return target.kind === "infinity" ? Math.round(p * 100) / 100 : -Math.round(p * 100) / 100;
  };
  if (v6.isZero() && v5.isZero()) return { kind: "converges", value: new D(0) };
  if (v6.abs().times(hundred).lte(v5.abs()) && v5.abs().times(hundred).lte(v4.abs())) return { kind: "vanishes", power: apparentPower() };
  if (v6.abs().gte(v5.abs().times(hundred)) && v5.abs().gte(v4.abs().times(hundred))) return { kind: "diverges", power: apparentPower() };
  const settled = v6.minus(v5).abs().lte(v6.abs().times(new D(10).pow(-9)));
  if (settled) return { kind: "converges", value: v6 };
  return { kind: "unclear", reason: "the values along the sequence neither settle nor grow steadily" };
}
