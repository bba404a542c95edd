import { z } from "zod";
import { effectivePotential } from "../spacetime/potential";
import { asRequestError, oneMetric, ONE_METRIC_MESSAGE, readSpacetime, spacetimeFields, symbolic } from "../spacetime/request";

/** The `potential` request: a static, spherically symmetric metric in (t, r, θ, φ); `definitions` such as r_s = 2GM/c² are substituted first. */
export const potentialRequestSchema = z.object(spacetimeFields).strict().refine(oneMetric, ONE_METRIC_MESSAGE);

/**
 * The `potential` verb: E and L, the radial equation in energy form, V_eff
 * and its terms with their limits as c → ∞.
 *
 * @example
 * runPotential({ coordinates: [...], metric: "…", definitions: { r_s: "\\frac{2GM}{c^2}" } }).terms.map((t) => t.name)
 */
export function runPotential(input: z.infer<typeof potentialRequestSchema>) {
  const { metric, definitions } = readSpacetime(input);
  const v = asRequestError("metric", () => effectivePotential(metric, definitions));
  return {
    conserved: { energy: symbolic(v.conserved.energy), angularMomentum: symbolic(v.conserved.angularMomentum) },
    radialEquation: symbolic(v.radialEquation),
    effectivePotential: symbolic(v.effectivePotential),
    terms: v.terms.map((t) => ({
      name: t.name,
      ...symbolic(t.expr),
      limit: t.limit === null ? null : t.limit === "infinity" ? "infinity" : symbolic(t.limit),
    })),
    perUnitMass: { radialEquation: symbolic(v.perUnitMass.radialEquation), effectivePotential: symbolic(v.perUnitMass.effectivePotential) },
    nullGeodesics: { radialEquation: symbolic(v.nullRadialEquation) },
    A: symbolic(v.A),
    B: symbolic(v.B),
    notes: [
      "equatorial plane θ = π/2; E = μc²A ṫ, L = μr²φ̇; per-unit-mass form in geometric units (G = c = 1)",
      "limits as c → ∞ are formal: each term's leading power of c",
    ],
  };
}
