import { z } from "zod";
import { orbitNumbers } from "../spacetime/orbits";
import { asRequestError, oneMetric, ONE_METRIC_MESSAGE, readSpacetime, readValues, spacetimeFields } from "../spacetime/request";

const positive = z.number().finite().positive();

/** The `orbits` request: the metric, `values` for its constants, and optionally an orbit (a, e), an impact parameter, two radii for the redshift. */
export const orbitsRequestSchema = z.object({
  ...spacetimeFields,
  values: z.record(z.string().min(1).max(200), z.number().finite()),
  semiMajorAxis: positive.optional(),
  eccentricity: z.number().finite().min(0).lt(1).optional(),
  impactParameter: positive.optional(),
  emitterRadius: positive.optional(),
  observerRadius: positive.optional(),
}).strict().refine(oneMetric, ONE_METRIC_MESSAGE);

/**
 * The `orbits` verb: photon sphere, ISCO, marginally bound orbit (radii in the
 * units of r), perihelion advance per orbit and light deflection (radians).
 * `precessionPerOrbit` and `deflection` are the numerically integrated values
 * (first order where the integration does not apply); both are in `details`.
 *
 * @example
 * runOrbits({ coordinates: [...], metric: "…", values: { r_s: 2 } }).isco // 6
 */
export function runOrbits(input: z.infer<typeof orbitsRequestSchema>) {
  const { metric, definitions } = readSpacetime(input);
  const o = asRequestError("metric", () => orbitNumbers(metric, {
    values: readValues(input.values),
    definitions,
    semiMajorAxis: input.semiMajorAxis,
    eccentricity: input.eccentricity,
    impactParameter: input.impactParameter,
    emitterRadius: input.emitterRadius,
    observerRadius: input.observerRadius,
  }));
  return {
    photonSphere: o.photonSphere,
    isco: o.isco,
    marginallyBound: o.marginallyBound,
    ...(o.precessionPerOrbit ? { precessionPerOrbit: o.precessionPerOrbit.numerical ?? o.precessionPerOrbit.firstOrder } : {}),
    ...(o.deflection ? { deflection: o.deflection.numerical ?? o.deflection.firstOrder } : {}),
    details: {
      units: o.units,
      horizon: o.horizon,
      circularOrbits: o.circularOrbits,
      ...(o.precessionPerOrbit ? { precession: o.precessionPerOrbit } : {}),
      ...(o.deflection ? { deflection: o.deflection } : {}),
      ...(o.redshift !== undefined ? { redshift: o.redshift } : {}),
    },
  };
}
