import type { CheckContext } from "../check/protocol";

/**
 * The wire shape of the `limit` verb (the limit probe), shared by the CLI
 * (`npm run -s cas -- limit`), `POST /api/cas/limit`, the browser worker and the
 * editor's margin. Runtime validation (zod) lives in `cas/api/limit.ts`.
 *
 * @example
 * const request: LimitProbeRequest = {
 *   context: { symbols: { r: "length", L: "L^2 T^-1" } },
 *   expression: "-\\frac{GM}{r} + \\frac{L^2}{2r^2} - \\frac{GML^2}{c^2 r^3}",
 *   parameter: "c",
 *   target: "infinity",
 * };
 */
export interface LimitProbeRequest {
  /** The same context a step check takes: declared symbols, definitions, assumptions. */
  readonly context: CheckContext;
  /** LaTeX of an expression or an equation. */
  readonly expression: string;
  /** The symbol that goes to the limit, e.g. "c", "Q", "r". */
  readonly parameter: string;
  /** "infinity" (also "\\infty", "∞") or a finite number such as "0", approached from above. */
  readonly target: string;
  /**
   * What the expression should tend to. An expression for an expression; for an equation, an
   * equation whose lhs − rhs the limit of lhs − rhs must be a fixed non-zero multiple of.
   * Left out, an equation's two sides are compared with each other.
   */
  readonly expected?: string;
  readonly syntax?: "latex" | "plain";
}

/**
 * What the values along the sequence suggest, over every sample point. `like` is
 * LaTeX of the scale the value behaves as: c^{-2} as c → ∞, Q^{2} as Q → 0.
 */
export type LimitEstimateWire =
  /** `value` at the first sample point (decimal); `constant`: the same at every point; `free`: the parameter does not occur. */
  | { readonly kind: "converges"; readonly value: string; readonly constant: boolean; readonly free: boolean }
  | { readonly kind: "vanishes"; readonly power: number; readonly like: string }
  | { readonly kind: "diverges"; readonly power: number; readonly like: string }
  | { readonly kind: "unclear"; readonly reason: string };

/** How one additive term ends up: gone, still there (finite, non-zero), growing, or not known. */
export type TermFate = "vanishes" | "remains" | "diverges" | "unclear";

export interface LimitTermReport {
  readonly latex: string;
  readonly estimate: LimitEstimateWire;
  readonly fate: TermFate;
  /** As the parameter grows: its formal leading power in the term (ignores cancellation); only for a limit at infinity. */
  readonly formalPower?: number | null;
}

export interface LimitSideReport {
  readonly side: "left" | "right" | "expression";
  readonly latex: string;
  readonly estimate: LimitEstimateWire;
  readonly terms: readonly LimitTermReport[];
  /** LaTeX of the side in the limit, when every term that stays does not involve the parameter at all. */
  readonly limit?: string;
}

/** Whether two things tend to the same limit, at every sample point. */
export interface LimitAgreement {
  readonly same: "yes" | "no" | "unclear";
  readonly detail: string;
  /** The sample point (plain identifiers → decimals) where they were seen to differ. */
  readonly witness?: Readonly<Record<string, string>>;
}

export interface LimitProbeAnswer {
  /** The parameter as given (LaTeX). */
  readonly parameter: string;
  /** "infinity", or the finite value as a decimal. */
  readonly target: string;
  /** The parameter values walked through, in words. */
  readonly sequence: string;
  readonly points: number;
  readonly digits: number;
  readonly kind: "expression" | "relation";
  readonly sides: readonly LimitSideReport[];
  /** For an equation: do both sides tend to the same thing. */
  readonly relation?: LimitAgreement;
  /** When `expected` was given: does the expression tend to it. */
  readonly expected?: LimitAgreement & { readonly latex: string };
  /** LaTeX of the additive terms that vanish in the limit, and of those that stay. */
  readonly vanishing: readonly string[];
  readonly remaining: readonly string[];
  /** Things worth knowing about this probe (a parameter that does not occur, definitions not used). */
  readonly notes: readonly string[];
  /** Always present: a formal numeric estimate along a finite sequence, not a proof. */
  readonly note: string;
}
