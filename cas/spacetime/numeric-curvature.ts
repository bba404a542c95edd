import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { freeVariables } from "../expr/traverse";
import { differentiate } from "../calculus/differentiate";
import { evaluateDecimal, type DecimalContext } from "../numeric/evaluate";
import { freezeTrig, jetify } from "../simplify/probe";
import type { Metric } from "./metric";

/**
 * The whole curvature sheet at one point, in decimal arithmetic, straight from
 * the raw metric trees and their tree derivatives — no rational normal form,
 * no simplification. It is the unsimplified result every displayed component
 * is checked against.
 */
export interface CurvatureAtPoint {
  readonly ginv: Decimal[][];
  readonly christoffel: Decimal[][][];
  readonly riemann: Decimal[][][][];
  readonly ricci: Decimal[][];
  readonly ricciScalar: Decimal;
  readonly einstein: Decimal[][];
  readonly kretschmann: Decimal;
}

/** Raw derivative trees of a metric, made once and evaluated at many points. */
export interface RawDerivatives {
  readonly g: Expr[][];
  readonly dg: Expr[][][];
  readonly ddg: Expr[][][][];
  /** Every name a point must bind (symbols, jets of undetermined functions, frozen "sin(x)"/"cos(x)"). */
  readonly names: ReadonlySet<string>;
}

export function rawDerivatives(metric: Metric): RawDerivatives {
  const n = metric.coordinates.length;
  const names = new Set<string>();
  const keep = (e: Expr) => { const j = freezeTrig(jetify(e)); freeVariables(j).forEach((v) => names.add(v)); return j; };
  const g = metric.components.map((row) => row.map(keep));
  const first = metric.coordinates.map((c) => metric.components.map((row) => row.map((e) => differentiate(e, c))));
  const dg = first.map((layer) => layer.map((row) => row.map(keep)));
  const ddg = metric.coordinates.map((c) => first.map((layer) => layer.map((row) => row.map((e) => keep(differentiate(e, c))))));
  void n;
  return { g, dg, ddg, names };
}

/** s + x·y, skipping the product when a factor is zero (most metric entries are). */
function mulAdd(s: Decimal, x: Decimal, y: Decimal): Decimal {
  return x.isZero() || y.isZero() ? s : s.plus(x.times(y));
}

function invert(D: DecimalContext, m: Decimal[][]): Decimal[][] {
  const n = m.length;
  const a = m.map((row) => [...row]);
  const inv = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => new D(i === j ? 1 : 0)));
  for (let col = 0; col < n; col += 1) {
    let pivot = col;
    for (let row = col + 1; row < n; row += 1) if (a[row][col].abs().gt(a[pivot][col].abs())) pivot = row;
    if (a[pivot][col].isZero()) throw new RangeError("the metric is singular at this point");
    [a[col], a[pivot]] = [a[pivot], a[col]];
    [inv[col], inv[pivot]] = [inv[pivot], inv[col]];
    const p = a[col][col];
    for (let j = 0; j < n; j += 1) { a[col][j] = a[col][j].div(p); inv[col][j] = inv[col][j].div(p); }
    for (let row = 0; row < n; row += 1) {
      if (row === col) continue;
      const f = a[row][col];
      if (f.isZero()) continue;
      for (let j = 0; j < n; j += 1) { a[row][j] = a[row][j].minus(f.times(a[col][j])); inv[row][j] = inv[row][j].minus(f.times(inv[col][j])); }
    }
  }
  return inv;
}

/**
 * Evaluates the curvature sheet at one point (values for every name in `raw.names`).
 * Throws an EvaluationError when the point is outside the domain.
 *
 * @example
 * const at = curvatureAtPoint(D, rawDerivatives(metric), values); at.kretschmann
 */
export function curvatureAtPoint(D: DecimalContext, raw: RawDerivatives, values: Record<string, Decimal>): CurvatureAtPoint {
  const ev = (e: Expr) => evaluateDecimal(D, e, { values });
  const n = raw.g.length;
  const range = [...Array(n).keys()];
  const zero = new D(0);
  const half = new D("0.5");
  const g = raw.g.map((row) => row.map(ev));
  const dg = raw.dg.map((l) => l.map((row) => row.map(ev)));
  const ddg = raw.ddg.map((l2) => l2.map((l) => l.map((row) => row.map(ev))));
  const ginv = invert(D, g);
  // ∂_e g^{ad} = −g^{af} ∂_e g_{fh} g^{hd}
  const dginv = range.map((e) => range.map((a) => range.map((d) => {
    let s = zero;
    for (const f of range) for (const h of range) if (!ginv[a][f].isZero() && !ginv[h][d].isZero()) s = s.minus(ginv[a][f].times(dg[e][f][h]).times(ginv[h][d]));
    return s;
  })));
  const low = (b: number, c: number, d: number) => dg[b][d][c].plus(dg[c][d][b]).minus(dg[d][b][c]).times(half);
  const dLow = (e: number, b: number, c: number, d: number) => ddg[e][b][d][c].plus(ddg[e][c][d][b]).minus(ddg[e][d][b][c]).times(half);
  const gamma = range.map((a) => range.map((b) => range.map((c) => range.reduce((s, d) => (ginv[a][d].isZero() ? s : s.plus(ginv[a][d].times(low(b, c, d)))), zero))));
  const dGamma = range.map((e) => range.map((a) => range.map((b) => range.map((c) =>
    range.reduce((s, d) => { let t = ginv[a][d].isZero() ? s : s.plus(ginv[a][d].times(dLow(e, b, c, d))); if (!dginv[e][a][d].isZero()) t = t.plus(dginv[e][a][d].times(low(b, c, d))); return t; }, zero)))));
  const riemann = range.map((a) => range.map((b) => range.map((c) => range.map((d) => {
    let s = dGamma[c][a][d][b].minus(dGamma[d][a][c][b]);
    for (const e of range) s = mulAdd(mulAdd(s, gamma[a][c][e], gamma[e][d][b]), gamma[a][d][e].neg(), gamma[e][c][b]);
    return s;
  }))));
  const ricci = range.map((b) => range.map((d) => range.reduce((s, a) => s.plus(riemann[a][b][a][d]), zero)));
  const ricciScalar = range.reduce((s, b) => range.reduce((t, d) => t.plus(ginv[b][d].times(ricci[b][d])), s), zero);
  const einstein = range.map((a) => range.map((b) => ricci[a][b].minus(half.times(ricciScalar).times(g[a][b]))));
  const down = range.map((a) => range.map((b) => range.map((c) => range.map((d) => range.reduce((s, e) => mulAdd(s, g[a][e], riemann[e][b][c][d]), zero)))));
  // R^{a}_{b}{}^{cd}: raise c, d of R^a_{bcd}; K = R_{a}{}^{b}{}_{cd}... computed as down · fully raised
  // Raise all four indices, each over the non-zero entries of g^{ab} only.
  const nonZero = range.map((a) => range.filter((y) => !ginv[a][y].isZero()));
  let up = down;
  for (let slot = 0; slot < 4; slot += 1) {
    const t = up;
    up = range.map((a) => range.map((b) => range.map((c) => range.map((d) => {
      const idx = [a, b, c, d];
      let s = zero;
      for (const y of nonZero[idx[slot]]) {
        idx[slot] = y;
        const v = t[idx[0]][idx[1]][idx[2]][idx[3]];
        if (!v.isZero()) s = s.plus(ginv[[a, b, c, d][slot]][y].times(v));
      }
      return s;
    }))));
  }
  let kretschmann = zero;
  for (const a of range) for (const b of range) for (const c of range) for (const d of range) kretschmann = mulAdd(kretschmann, down[a][b][c][d], up[a][b][c][d]);
  return { ginv, christoffel: gamma, riemann, ricci, ricciScalar, einstein, kretschmann };
}
