import { z } from "zod";
import { relation, num } from "../expr/build";
import { latexName } from "../print/latex-names";
import { geodesics } from "../spacetime/geodesics";
import { asRequestError, oneMetric, ONE_METRIC_MESSAGE, readSpacetime, spacetimeFields, symbolic } from "../spacetime/request";

/** The `geodesics` request: coordinates, a metric, optionally the curve parameter (default τ). */
export const geodesicsRequestSchema = z.object(spacetimeFields).strict().refine(oneMetric, ONE_METRIC_MESSAGE);

/**
 * The `geodesics` verb: Lagrangian g_ab ẋ^a ẋ^b, Euler–Lagrange equations
 * (each `… = 0`), Killing vectors of cyclic coordinates and their Noether quantities.
 *
 * @example
 * runGeodesics({ coordinates: ["t","r","\\theta","\\phi"], metric: "…" }).killing.map((k) => k.coordinate) // ["t", "\\phi"]
 */
export function runGeodesics(input: z.infer<typeof geodesicsRequestSchema>) {
  const { metric, parameter } = readSpacetime(input);
  const system = asRequestError("metric", () => geodesics(metric, parameter));
  const name = (plain: string) => latexName(plain);
  return {
    lagrangian: symbolic(system.lagrangian),
    equations: system.equations.map((e) => ({ coordinate: name(e.coordinate), index: e.index, ...symbolic(relation(e.expr, "=", num(0))) })),
    killing: system.killing.map((k) => ({ coordinate: name(k.coordinate), index: k.index, components: k.components, latex: `\\partial_{${name(k.coordinate)}}`, expr: `partial_${k.coordinate}` })),
    conserved: system.conserved.map((c) => ({
      coordinate: name(c.coordinate),
      index: c.index,
      name: c.name,
      perUnitMass: symbolic(c.perUnitMass),
      withMass: symbolic(c.withMass),
    })),
    normalisation: { timelike: symbolic(system.normalisation.timelike), null: symbolic(system.normalisation.null) },
    parameter: name(system.parameter),
  };
}
