import { z } from "zod";
import { computeCurvatureSync, CONVENTIONS, type TensorComponent } from "../spacetime/curvature-sheet";
import { asRequestError, oneMetric, ONE_METRIC_MESSAGE, readSpacetime, spacetimeFields, symbolic } from "../spacetime/request";

/** The `curvature` request: coordinates and a metric (line element or components). */
export const curvatureRequestSchema = z.object({
  ...spacetimeFields,
  /** Also try nerdamer's simplify/factor on each component (slower; still verified). */
  thorough: z.boolean().optional(),
}).strict().refine(oneMetric, ONE_METRIC_MESSAGE);

const listed = (components: readonly TensorComponent[]) => components.map((c) => ({ index: c.index, ...symbolic(c.expr) }));

/**
 * The `curvature` verb: the curvature sheet, non-zero components only, each in
 * the shortest form verified against the unsimplified value.
 *
 * @example
 * runCurvature({ coordinates: ["t","r","\\theta","\\phi"], metric: "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2 dt^2 + …" }).ricci // []
 */
export function runCurvature(input: z.infer<typeof curvatureRequestSchema>) {
  const { metric } = readSpacetime(input);
  const sheet = asRequestError("metric", () => computeCurvatureSync(metric, { thorough: input.thorough }));
  return {
    christoffel: listed(sheet.christoffel),
    riemann: listed(sheet.riemann),
    ricci: listed(sheet.ricci),
    ricciScalar: symbolic(sheet.ricciScalar),
    einstein: listed(sheet.einstein),
    kretschmann: symbolic(sheet.kretschmann),
    conventions: {
      ...CONVENTIONS,
      signature: sheet.signature.text,
      coordinates: sheet.coordinates,
      verification: `every listed component equals the unsimplified value at ${sheet.verification.points} random points (${sheet.verification.digits}-digit arithmetic, to within ${sheet.verification.tolerance.toExponential(0)} relative), and every omitted one is 0 there; a numeric check is strong evidence, not a proof`,
    },
    timings: sheet.timings,
  };
}
