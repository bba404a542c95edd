import { decimalContext, type DecimalContext } from "../numeric/evaluate";
import { ddArithmetic, decimalArithmetic, OutOfRangeError, type Arithmetic } from "../numeric/arithmetic";
import { compileTree, fillSlots, SlotNames } from "../numeric/compile";
import { freeNamesOf, freezeTrig, jetify, randomSource, randomValues } from "../simplify/probe";
import { MetricError, type Metric } from "./metric";

/** The signs of the metric's eigenvalues at the probe points. */
export interface Signature {
  readonly negative: number;
  readonly positive: number;
  /** e.g. "(-,+,+,+)" — minus signs first, whatever the coordinate order. */
  readonly text: string;
  readonly lorentzian: boolean;
}

function eigenvalues(m: number[][]): number[] {
  // Cyclic Jacobi rotations: ample for a 4×4 symmetric matrix.
  const n = m.length;
  const a = m.map((row) => [...row]);
  for (let sweep = 0; sweep < 60; sweep += 1) {
    let off = 0;
    for (let p = 0; p < n; p += 1) for (let q = p + 1; q < n; q += 1) off += a[p][q] * a[p][q];
    if (off < 1e-30) break;
    for (let p = 0; p < n; p += 1) for (let q = p + 1; q < n; q += 1) {
      if (a[p][q] === 0) continue;
      const theta = (a[q][q] - a[p][p]) / (2 * a[p][q]);
      const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
      const c = 1 / Math.sqrt(t * t + 1);
      const s = t * c;
      for (let k = 0; k < n; k += 1) {
        const akp = a[k][p], akq = a[k][q];
        a[k][p] = c * akp - s * akq;
        a[k][q] = s * akp + c * akq;
      }
      for (let k = 0; k < n; k += 1) {
        const apk = a[p][k], aqk = a[q][k];
        a[p][k] = c * apk - s * aqk;
        a[q][k] = s * apk + c * aqk;
      }
    }
  }
  return a.map((row, i) => row[i]);
}

/**
 * Checks a metric at random points: symmetric, non-degenerate (det ≠ 0), and
 * reports its signature. Throws a {@link MetricError} saying what is wrong.
 * The check is numeric (probabilistic): it samples points, it does not prove.
 * Runs in double-double (31 digits, ample for the 1e-20 symmetry tolerance),
 * in decimal.js at 30 digits when a value leaves double-double's range.
 *
 * @example
 * validateMetric(schwarzschild).text // "(-,+,+,+)"
 */
export function validateMetric(metric: Metric, points = 3): Signature {
  const D = decimalContext(30);
  try {
    return validateIn(ddArithmetic, D, metric, points);
  } catch (err) {
    if (!(err instanceof OutOfRangeError)) throw err;
    return validateIn(decimalArithmetic(D), D, metric, points);
  }
}

function validateIn<N>(A: Arithmetic<N>, D: DecimalContext, metric: Metric, points: number): Signature {
  const names = new SlotNames();
  // sin/cos of a coordinate frozen to one name, computed once per point rather than once per entry.
  const trees = metric.components.map((row) => row.map((e) => compileTree(A, freezeTrig(jetify(e)), names)));
  const free = freeNamesOf(names.names);
  const next = randomSource(7);
  let found: Signature | null = null;
  let evaluated = 0;
  for (let attempt = 0; attempt < points * 6 && evaluated < points; attempt += 1) {
    const slots: (N | undefined)[] = [];
    fillSlots(A, names, randomValues(D, free, next), slots);
    let g: N[][];
    try {
      g = trees.map((row) => row.map((run) => run(slots as N[])));
    } catch (err) {
      if (err instanceof OutOfRangeError) throw err;
      continue;
    }
    evaluated += 1;
    const n = g.length;
    for (let a = 0; a < n; a += 1) for (let b = a + 1; b < n; b += 1) {
      const scale = A.size(g[a][b]) >= A.size(g[b][a]) ? g[a][b] : g[b][a];
      if (!A.negligible(A.sub(g[a][b], g[b][a]), scale, 1e-20)) {
        throw new MetricError(`the metric is not symmetric: g[${metric.coordinates[a]}][${metric.coordinates[b]}] ≠ g[${metric.coordinates[b]}][${metric.coordinates[a]}]`);
      }
    }
    const eig = eigenvalues(g.map((row) => row.map((x) => A.toNumber(x))));
    const biggest = Math.max(...eig.map(Math.abs));
    if (eig.some((x) => Math.abs(x) <= 1e-12 * biggest)) throw new MetricError("the metric is degenerate (det = 0) at a probe point");
    const negative = eig.filter((x) => x < 0).length;
    const sig: Signature = {
      negative,
      positive: n - negative,
      text: `(${[...Array(negative).fill("-"), ...Array(n - negative).fill("+")].join(",")})`,
      lorentzian: negative === 1 || negative === n - 1,
    };
    found ??= sig;
  }
  if (found === null) throw new MetricError("the metric could not be evaluated at any probe point (check the symbols and functions it uses)");
  return found;
}
