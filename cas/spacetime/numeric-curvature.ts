import type { Expr } from "../expr/types";
import { freeVariables } from "../expr/traverse";
import { differentiate } from "../calculus/differentiate";
import type { Arithmetic } from "../numeric/arithmetic";
import { compileTree, type Compiled, type SlotNames } from "../numeric/compile";
import { freezeTrig, jetify } from "../simplify/probe";
import type { Metric } from "./metric";

/**
 * The whole curvature sheet at one point, in double-double or decimal arithmetic, straight from
 * the raw metric trees and their tree derivatives — no rational normal form,
 * no simplification. It is the unsimplified result every displayed component
 * is checked against.
 */
export interface CurvatureAtPoint<N> {
  readonly ginv: N[][];
  readonly christoffel: N[][][];
  readonly riemann: N[][][][];
  readonly ricci: N[][];
  readonly ricciScalar: N;
  readonly einstein: N[][];
  readonly kretschmann: N;
}

/** Raw derivative trees of a metric, made once and evaluated at many points. */
export interface RawDerivatives {
  readonly g: Expr[][];
  readonly dg: Expr[][][];
  readonly ddg: Expr[][][][];
  /** Every name a point must bind (symbols, jets of undetermined functions, frozen "sin(x)"/"cos(x)"). */
  readonly names: ReadonlySet<string>;
}

/**
 * The metric's trees and their first and second tree derivatives. Derivatives
 * are made for a ≤ b and mirrored (the metric was checked symmetric), and
 * second derivatives for e ≤ c and mirrored (partial derivatives commute): the
 * mirrored entries are the same tree objects.
 */
export function rawDerivatives(metric: Metric): RawDerivatives {
  const n = metric.coordinates.length;
  const names = new Set<string>();
  const keep = (e: Expr) => { const j = freezeTrig(jetify(e)); freeVariables(j).forEach((v) => names.add(v)); return j; };
  const symmetric = <T>(make: (a: number, b: number) => T): T[][] => {
    const out: T[][] = Array.from({ length: n }, () => new Array<T>(n));
    for (let a = 0; a < n; a += 1) for (let b = a; b < n; b += 1) out[a][b] = out[b][a] = make(a, b);
    return out;
  };
  const g = metric.components.map((row) => row.map(keep));
  const first = metric.coordinates.map((c) => symmetric((a, b) => differentiate(metric.components[a][b], c)));
  const dg = first.map((layer) => layer.map((row) => row.map(keep)));
  const second = symmetric((e, c) => symmetric((a, b) => keep(differentiate(first[c][a][b], metric.coordinates[e]))));
  const ddg = metric.coordinates.map((_, e) => metric.coordinates.map((_, c) => second[e][c]));
  return { g, dg, ddg, names };
}

/** The metric and its first and second derivatives at one point. */
export interface MetricValues<N> {
  readonly g: N[][];
  readonly dg: N[][][];
  readonly ddg: N[][][][];
}

/**
 * Compiles the raw derivative trees once (names bound in `names`); the result
 * evaluates them at a point given in slot order.
 */
export function compileRawDerivatives<N>(A: Arithmetic<N>, raw: RawDerivatives, names: SlotNames): (point: readonly N[]) => MetricValues<N> {
  // Mirrored entries share one tree: compile and evaluate it once.
  const trees = new Map<Expr, number>();
  const programs: Compiled<N>[] = [];
  const index = (e: Expr) => {
    let i = trees.get(e);
    if (i === undefined) {
      i = programs.length;
      trees.set(e, i);
      programs.push(compileTree(A, e, names));
    }
    return i;
  };
  const g = raw.g.map((row) => row.map(index));
  const dg = raw.dg.map((l) => l.map((row) => row.map(index)));
  const ddg = raw.ddg.map((l2) => l2.map((l) => l.map((row) => row.map(index))));
  return (p) => {
    const v = programs.map((run) => run(p));
    return {
      g: g.map((row) => row.map((i) => v[i])),
      dg: dg.map((l) => l.map((row) => row.map((i) => v[i]))),
      ddg: ddg.map((l2) => l2.map((l) => l.map((row) => row.map((i) => v[i])))),
    };
  };
}

function invert<N>(A: Arithmetic<N>, m: N[][]): N[][] {
  const n = m.length;
  const a = m.map((row) => [...row]);
  const one = A.literal("1");
  const inv = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? one : A.zero)));
  for (let col = 0; col < n; col += 1) {
    let pivot = col;
    for (let row = col + 1; row < n; row += 1) if (A.size(a[row][col]) > A.size(a[pivot][col])) pivot = row;
    if (A.isZero(a[pivot][col])) throw new RangeError("the metric is singular at this point");
    [a[col], a[pivot]] = [a[pivot], a[col]];
    [inv[col], inv[pivot]] = [inv[pivot], inv[col]];
    const p = a[col][col];
    for (let j = 0; j < n; j += 1) { a[col][j] = A.div(a[col][j], p); inv[col][j] = A.div(inv[col][j], p); }
    for (let row = 0; row < n; row += 1) {
      if (row === col) continue;
      const f = a[row][col];
      if (A.isZero(f)) continue;
      for (let j = 0; j < n; j += 1) { a[row][j] = A.sub(a[row][j], A.mul(f, a[col][j])); inv[row][j] = A.sub(inv[row][j], A.mul(f, inv[col][j])); }
    }
  }
  return inv;
}

/**
 * The curvature sheet at one point from the metric's values there, in
 * arithmetic `A`. Throws an EvaluationError (or a RangeError for a singular
 * metric) when the point is unusable. Products with an exact zero factor are
 * skipped (most metric entries are 0); plain loops, as this runs per point.
 *
 * @example
 * const at = curvatureAtPoint(ddArithmetic, compileRawDerivatives(ddArithmetic, rawDerivatives(metric), names)(point)); at.kretschmann
 */
export function curvatureAtPoint<N>(A: Arithmetic<N>, values: MetricValues<N>): CurvatureAtPoint<N> {
  const { g, dg, ddg } = values;
  const n = g.length;
  const zero = A.zero;
  const half = A.half;
  const table = <T>(make: (i: number) => T): T[] => { const out = new Array<T>(n); for (let i = 0; i < n; i += 1) out[i] = make(i); return out; };
  const isZero = (x: N) => A.isZero(x);
  const ginv = invert(A, g);
  // ∂_e g^{ad} = −g^{af} ∂_e g_{fh} g^{hd}
  const dginv = table((e) => table((a) => table((d) => {
    let s = zero;
    for (let f = 0; f < n; f += 1) {
      if (isZero(ginv[a][f])) continue;
      for (let h = 0; h < n; h += 1) if (!isZero(ginv[h][d]) && !isZero(dg[e][f][h])) s = A.sub(s, A.mul(A.mul(ginv[a][f], dg[e][f][h]), ginv[h][d]));
    }
    return s;
  })));
  // Γ_{dbc} = ½(∂_b g_{dc} + ∂_c g_{db} − ∂_d g_{bc}) and its derivatives ∂_e Γ_{dbc}, stored [b][c][d].
  const low = table((b) => table((c) => table((d) => A.mul(A.sub(A.add(dg[b][d][c], dg[c][d][b]), dg[d][b][c]), half))));
  const gamma = table((a) => table((b) => table((c) => {
    let s = zero;
    for (let d = 0; d < n; d += 1) if (!isZero(ginv[a][d]) && !isZero(low[b][c][d])) s = A.add(s, A.mul(ginv[a][d], low[b][c][d]));
    return s;
  })));
  const dGamma = table((e) => {
    const dLow = table((b) => table((c) => table((d) => A.mul(A.sub(A.add(ddg[e][b][d][c], ddg[e][c][d][b]), ddg[e][d][b][c]), half))));
    return table((a) => table((b) => table((c) => {
      let s = zero;
      for (let d = 0; d < n; d += 1) {
        if (!isZero(ginv[a][d]) && !isZero(dLow[b][c][d])) s = A.add(s, A.mul(ginv[a][d], dLow[b][c][d]));
        if (!isZero(dginv[e][a][d]) && !isZero(low[b][c][d])) s = A.add(s, A.mul(dginv[e][a][d], low[b][c][d]));
      }
      return s;
    })));
  });
  const riemann = table((a) => table((b) => table((c) => table((d) => {
    let s = A.sub(dGamma[c][a][d][b], dGamma[d][a][c][b]);
    for (let e = 0; e < n; e += 1) {
      if (!isZero(gamma[a][c][e]) && !isZero(gamma[e][d][b])) s = A.add(s, A.mul(gamma[a][c][e], gamma[e][d][b]));
      if (!isZero(gamma[a][d][e]) && !isZero(gamma[e][c][b])) s = A.sub(s, A.mul(gamma[a][d][e], gamma[e][c][b]));
    }
    return s;
  }))));
  const ricci = table((b) => table((d) => { let s = zero; for (let a = 0; a < n; a += 1) s = A.add(s, riemann[a][b][a][d]); return s; }));
  let ricciScalar = zero;
  for (let b = 0; b < n; b += 1) for (let d = 0; d < n; d += 1) if (!isZero(ginv[b][d])) ricciScalar = A.add(ricciScalar, A.mul(ginv[b][d], ricci[b][d]));
  const halfScalar = A.mul(half, ricciScalar);
  const einstein = table((a) => table((b) => A.sub(ricci[a][b], A.mul(halfScalar, g[a][b]))));
  return { ginv, christoffel: gamma, riemann, ricci, ricciScalar, einstein, kretschmann: kretschmannAt(A, g, ginv, riemann) };
}

/**
 * K = R_{abcd} R^{abcd} from R^a_{bcd}: lower the first index, raise the other
 * three, each over the non-zero entries of the metric only (flat arrays).
 */
function kretschmannAt<N>(A: Arithmetic<N>, g: N[][], ginv: N[][], riemann: N[][][][]): N {
  const n = g.length;
  const size = n ** 4;
  const flat = new Array<N>(size);
  let i = 0;
  for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) for (let c = 0; c < n; c += 1) for (let d = 0; d < n; d += 1) flat[i++] = riemann[a][b][c][d];
  // One index of a flat n^4 array contracted with m: out[..x..] = Σ_y m[x][y] t[..y..].
  const contract = (t: N[], m: N[][], slot: number): N[] => {
    const stride = n ** (3 - slot);
    const nonZero = m.map((row) => row.flatMap((v, y) => (A.isZero(v) ? [] : [y])));
    const out = new Array<N>(size);
    for (let j = 0; j < size; j += 1) {
      const x = Math.floor(j / stride) % n;
      let s = A.zero;
      for (const y of nonZero[x]) {
        const v = t[j + (y - x) * stride];
        if (!A.isZero(v)) s = A.add(s, A.mul(m[x][y], v));
      }
      out[j] = s;
    }
    return out;
  };
  const down = contract(flat, g, 0);
  let up = down;
  for (let slot = 0; slot < 4; slot += 1) up = contract(up, ginv, slot);
  let k = A.zero;
  for (let j = 0; j < size; j += 1) if (!A.isZero(down[j]) && !A.isZero(up[j])) k = A.add(k, A.mul(down[j], up[j]));
  return k;
}
