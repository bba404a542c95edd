import type { Expr } from "../expr/types";
import { evaluateFloat } from "./evaluate";

/** One sample of a curve: `y` is null where the expression has no finite value (a pole, a square root of a negative). */
export interface CurvePoint {
  readonly x: number;
  readonly y: number | null;
}

export interface CurveOptions {
  /** Values for every other free name of the expression. */
  readonly values: Readonly<Record<string, number>>;
  readonly from: number;
  readonly to: number;
  /** Number of samples, ends included (at least 2). */
  readonly count: number;
  /** "log" spaces the samples geometrically (needs 0 < from < to): useful for potentials in r. */
  readonly spacing?: "linear" | "log";
}

/**
 * Samples an expression of one variable in float64, for plotting. Never throws on
 * a bad point: that sample's `y` is null, so a plot shows a gap rather than a lie.
 *
 * @example
 * sampleCurve(readPlainExpr("1 - r_s/r"), "r", { values: { r_s: 1 }, from: 1, to: 4, count: 4 })
 * // [{ x: 1, y: 0 }, { x: 2, y: 0.5 }, { x: 3, y: 0.666… }, { x: 4, y: 0.75 }]
 */
export function sampleCurve(expr: Expr, variable: string, options: CurveOptions): CurvePoint[] {
  const { from, to, values } = options;
  const count = Math.max(2, Math.floor(options.count));
  const log = options.spacing === "log";
  if (log && !(from > 0 && to > from)) throw new RangeError("log spacing needs 0 < from < to");
  const ratio = log ? Math.pow(to / from, 1 / (count - 1)) : 0;
  const step = (to - from) / (count - 1);
  const out: CurvePoint[] = [];
  for (let i = 0; i < count; i += 1) {
    const x = i === count - 1 ? to : log ? from * Math.pow(ratio, i) : from + step * i;
    let y: number | null;
    try {
      y = evaluateFloat(expr, { values: { ...values, [variable]: x } });
    } catch {
      y = null;
    }
    out.push({ x, y: y !== null && Number.isFinite(y) ? y : null });
  }
  return out;
}

/**
 * The interior extrema of a sampled curve, where its slope changes sign: minima
 * and maxima, each refined to the vertex of the parabola through three samples.
 * A sign change across a gap (null) is not an extremum.
 *
 * @example
 * curveExtrema(sampleCurve(readPlainExpr("(x-2)^2"), "x", { values: {}, from: 0, to: 4, count: 41 })) // [{ x: 2, y: 0, kind: "minimum" }]
 */
export function curveExtrema(points: readonly CurvePoint[]): { x: number; y: number; kind: "minimum" | "maximum" }[] {
  const out: { x: number; y: number; kind: "minimum" | "maximum" }[] = [];
  for (let i = 1; i + 1 < points.length; i += 1) {
    const [p, q, s] = [points[i - 1], points[i], points[i + 1]];
    if (p.y === null || q.y === null || s.y === null) continue;
    const left = q.y - p.y;
    const right = s.y - q.y;
    const kind = left < 0 && right >= 0 ? "minimum" : left > 0 && right <= 0 ? "maximum" : null;
    if (!kind) continue;
    // vertex of the parabola through the three samples (non-uniform spacing)
    const d = (p.x - q.x) * (p.x - s.x) * (q.x - s.x);
    const A = (s.x * (q.y - p.y) + q.x * (p.y - s.y) + p.x * (s.y - q.y)) / d;
    const B = (s.x * s.x * (p.y - q.y) + q.x * q.x * (s.y - p.y) + p.x * p.x * (q.y - s.y)) / d;
    const C = (q.x * s.x * (q.x - s.x) * p.y + s.x * p.x * (s.x - p.x) * q.y + p.x * q.x * (p.x - q.x) * s.y) / d;
    const x = A !== 0 ? -B / (2 * A) : q.x;
    const inside = x > p.x && x < s.x;
    out.push(inside ? { x, y: A * x * x + B * x + C, kind } : { x: q.x, y: q.y, kind });
  }
  return out;
}
