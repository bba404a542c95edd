/**
 * The wire shape of a step check, shared by the CLI (`npm run -s cas -- check`),
 * `POST /api/cas/check`, the browser worker and the editor. Runtime validation
 * (zod) lives beside the handlers; these are the types they produce.
 *
 * @example
 * const request: CheckRequest = {
 *   context: { symbols: { r: "length", r_s: "length", c: "velocity" }, definitions: [], assumptions: ["r > r_s"] },
 *   from: "\\left(1-\\frac{r_s}{r}\\right)c^2",
 *   to: "c^2 - \\frac{r_s c^2}{r}",
 * };
 */
export interface CheckContext {
  /** Declared symbols (LaTeX) with a dimension ("M L^2 T^-1", "length", …) or null when undeclared. */
  readonly symbols?: Readonly<Record<string, string | null>>;
  /** Declared undetermined functions and their arguments, e.g. { "A": ["r"] }. */
  readonly functions?: Readonly<Record<string, readonly string[]>>;
  /** Relations that define symbols, e.g. "E = \\mu c^2 \\left(1-\\frac{r_s}{r}\\right)\\dot t". */
  readonly definitions?: readonly string[];
  /** Relations restricting the domain, e.g. "r > r_s", "\\theta = \\frac{\\pi}{2}". */
  readonly assumptions?: readonly string[];
  /** The curve parameter dotted symbols are derivatives by (default "\\tau"). */
  readonly parameter?: string;
}

export type Justification =
  | { readonly kind: "algebra" }
  | { readonly kind: "substitute"; readonly relations: readonly string[] }
  | { readonly kind: "differentiate"; readonly by: string }
  | { readonly kind: "euler-lagrange"; readonly coordinate: string; readonly parameter?: string }
  | { readonly kind: "limit"; readonly symbol: string; readonly to: string }
  | { readonly kind: "definition" };

export interface CheckRequest {
  readonly context: CheckContext;
  readonly from: string;
  readonly to: string;
  readonly justification?: Justification;
}

export type VerdictName = "verified" | "refuted" | "undecided";

/** How a verdict was reached, so the UI can say it plainly. */
export type CheckMethod =
  | { readonly kind: "symbolic"; readonly detail: string }
  | { readonly kind: "numeric"; readonly points: number; readonly digits: number; readonly detail?: string }
  | { readonly kind: "none"; readonly detail: string };

export interface TermDimension {
  readonly latex: string;
  /** e.g. "M L^2 T^-2", "dimensionless", or null when a symbol's dimension is unknown. */
  readonly dimension: string | null;
}

export interface DimensionReport {
  readonly consistent: boolean;
  readonly terms: readonly TermDimension[];
  /** Index into `terms` of the term that disagrees with the majority, when there is one. */
  readonly odd?: number;
}

export interface CheckAnswer {
  readonly verdict: VerdictName;
  readonly method: CheckMethod;
  /** Sample values (plain identifiers → decimal strings) at which a refuted step fails. */
  readonly witness?: Readonly<Record<string, string>>;
  readonly reason?: string;
  readonly dimensions?: DimensionReport;
  /** The two sides' values at the witness point (decimal strings), for a refuted step. */
  readonly witnessSides?: { readonly left: string; readonly right: string };
  /** Concrete smooth functions (plain syntax in x1, x2, …) that stood in for undetermined functions such as A(r). */
  readonly substitutedFunctions?: Readonly<Record<string, string>>;
}

/** A request the engine refused to run (malformed, too large, timed out). */
export interface CheckError {
  readonly error: { readonly code: string; readonly message: string; readonly position?: number };
}
