import { Ring } from "../simplify/algebra/ring";
import { toRatFun } from "../simplify/algebra/from-expr";
import { rfDerivativeBy } from "../simplify/algebra/calculus";
import type { RatFun } from "../simplify/algebra/ratfun";
import type { Metric } from "./metric";
import { inverseMatrix } from "./inverse";

/**
 * A metric read into exact rational functions, with its inverse and first
 * derivatives: what every curvature quantity is built from.
 */
export interface Geometry {
  readonly ring: Ring;
  readonly coordinates: readonly string[];
  readonly n: number;
  readonly g: RatFun[][];
  readonly ginv: RatFun[][];
  /** dg[c][a][b] = ∂_c g_ab */
  readonly dg: RatFun[][][];
}

/**
 * Reads the metric into a fresh ring (coordinates registered first, so printed
 * factors read r − r_s rather than r_s − r) and inverts it.
 *
 * @example
 * const geo = geometryOf(metric); geo.ginv[1][1] // g^{rr}
 */
export function geometryOf(metric: Metric): Geometry {
  const ring = new Ring();
  for (const c of metric.coordinates) ring.variable({ kind: "sym", name: c });
  const n = metric.coordinates.length;
  const g = metric.components.map((row) => row.map((e) => toRatFun(ring, e)));
  const ginv = inverseMatrix(ring, g);
  const dg = metric.coordinates.map((c) => g.map((row, a) => row.map((gab, b) => (b < a ? undefined! : rfDerivativeBy(ring, gab, c)))));
  for (const layer of dg) for (let a = 0; a < n; a += 1) for (let b = 0; b < a; b += 1) layer[a][b] = layer[b][a];
  return { ring, coordinates: metric.coordinates, n, g, ginv, dg };
}
