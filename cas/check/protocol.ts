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
  /** Coordinates (LaTeX), so `dr` reads as a differential and d/dτ moves them; default: the declared symbols among t, r, θ, φ, x, y, z. */
  readonly coordinates?: readonly string[];
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
  /** The syntax of `from`, `to` and every relation: LaTeX (default) or the plain calculator syntax. */
  readonly syntax?: "latex" | "plain";
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
  /** "unknown" when a symbol has no declared dimension (then `consistent` is false but nothing is wrong yet). */
  readonly status?: "consistent" | "inconsistent" | "unknown";
  /** Symbols (plain identifiers) whose dimension was needed but not declared. */
  readonly unknownSymbols?: readonly string[];
  /** What is wrong inside terms, e.g. "the argument of sin has dimension L; it must be dimensionless". */
  readonly problems?: readonly string[];
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
  /** `position` is a character offset within the request field named by `field` ("from", "to", "context.definitions[0]", …). */
  readonly error: { readonly code: string; readonly message: string; readonly position?: number; readonly field?: string };
}
