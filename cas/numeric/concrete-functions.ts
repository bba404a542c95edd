import type { Expr } from "../expr/types";
import { add, call, mul, num, pow } from "../expr/build";
import { randomDecimalText, type RandomStream } from "./random";

/** A concrete smooth function standing in for an undetermined one (`A(r)`), as a tree builder and a readable formula. */
export interface ConcreteFunction {
  readonly apply: (args: readonly Expr[]) => Expr;
  /** The formula in plain syntax with arguments x1, x2, … (shown beside a witness). */
  readonly formula: string;
}

/**
 * Draws a random smooth function of `arity` arguments: a positive polynomial
 * part plus an exponential, a0 + Σ aᵢxᵢ + Σ bᵢxᵢ² + c·exp(k Σ wᵢxᵢ).
 * A step that holds for every function holds for this one; a step that holds
 * only for special functions fails for it with probability one. The same
 * function is used on both sides of a step and differentiated symbolically, so
 * A and A' stay consistent.
 *
 * @example
 * const A = concreteFunction(1, rng);
 * A.apply([sym("r")]) // 0.73… + 1.1…*r + 0.4…*r^2 + 0.9…*exp(0.21…*r)
 */
export function concreteFunction(arity: number, rng: RandomStream): ConcreteFunction {
  const c = () => randomDecimalText(rng, 0.2, 1.5).replace(/0+$/, "");
  const a0 = c();
  const linear = Array.from({ length: arity }, c);
  const square = Array.from({ length: arity }, c);
  const amplitude = c();
  const rate = randomDecimalText(rng, 0.1, 0.4).replace(/0+$/, "");
  const weights = Array.from({ length: arity }, c);
  const apply = (args: readonly Expr[]): Expr => {
    const inner = add(...args.map((x, i) => mul(num(weights[i]), x)));
    return add(
      num(a0),
      ...args.map((x, i) => mul(num(linear[i]), x)),
      ...args.map((x, i) => mul(num(square[i]), pow(x, num(2)))),
      mul(num(amplitude), call("exp", mul(num(rate), inner))),
    );
  };
  const xs = Array.from({ length: arity }, (_, i) => `x${i + 1}`);
  const formula = [
    a0,
    ...xs.map((x, i) => `${linear[i]}*${x}`),
    ...xs.map((x, i) => `${square[i]}*${x}^2`),
    `${amplitude}*exp(${rate}*(${xs.map((x, i) => `${weights[i]}*${x}`).join(" + ")}))`,
  ].join(" + ");
  return { apply, formula };
}
