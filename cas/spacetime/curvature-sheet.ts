import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { exprSize } from "../expr/traverse";
import { decimalContext, evaluateDecimal, type DecimalContext } from "../numeric/evaluate";
import { completeTrigValues, freeNamesOf, freezeTrig, jetify, randomSource, randomValues } from "../simplify/probe";
import { freeVariables } from "../expr/traverse";
import { viaNerdamer } from "../simplify/nerdamer-bridge";
import { fromRatFun } from "../simplify/algebra/to-expr";
import { type RatFun, rfIsZero } from "../simplify/algebra/ratfun";
import type { Metric } from "./metric";
import { geometryOf, type Geometry } from "./geometry";
import { christoffel } from "./christoffel";
import { riemann } from "./riemann";
import { ricci, ricciScalar, einstein } from "./ricci";
import { kretschmann } from "./kretschmann";
import { validateMetric, type Signature } from "./validate";
import { curvatureAtPoint, rawDerivatives, type CurvatureAtPoint } from "./numeric-curvature";

/** One listed component: indices are positions in the coordinate list. */
export interface TensorComponent {
  readonly index: readonly number[];
  readonly expr: Expr;
}

export interface CurvatureSheet {
  readonly coordinates: readonly string[];
  readonly signature: Signature;
  readonly inverseMetric: readonly TensorComponent[];
  /** Γ^a_{bc}, b ≤ c, non-zero only. */
  readonly christoffel: readonly TensorComponent[];
  /** R^a_{bcd}, c < d, non-zero only. */
  readonly riemann: readonly TensorComponent[];
  /** R_{ab}, a ≤ b, non-zero only. */
  readonly ricci: readonly TensorComponent[];
  readonly ricciScalar: Expr;
  /** G_{ab}, a ≤ b, non-zero only. */
  readonly einstein: readonly TensorComponent[];
  readonly kretschmann: Expr;
  readonly verification: { readonly points: number; readonly digits: number; readonly checked: number };
  /** Milliseconds per stage. */
  readonly timings: Readonly<Record<string, number>>;
}

export interface CurvatureProgress {
  readonly stage: string;
  /** Stages finished so far, of `total`. */
  readonly done: number;
  readonly total: number;
}

export interface CurvatureOptions {
  readonly onProgress?: (p: CurvatureProgress) => void;
  readonly signal?: AbortSignal;
  /** Also try nerdamer's simplify/factor on each component (slower; results still verified). */
  readonly thorough?: boolean;
  /** Random points each component is checked at (default 2) and digits (default 40). */
  readonly points?: number;
  readonly digits?: number;
}

/** The sign conventions of the sheet (Misner, Thorne & Wheeler 1973), stated with every answer. */
export const CONVENTIONS = {
  reference: "Misner, Thorne & Wheeler, Gravitation (1973), sign conventions (+,+,+)",
  christoffel: "\\Gamma^a_{bc} = \\tfrac12 g^{ad}\\left(\\partial_b g_{dc} + \\partial_c g_{db} - \\partial_d g_{bc}\\right)",
  riemann: "R^a{}_{bcd} = \\partial_c \\Gamma^a_{db} - \\partial_d \\Gamma^a_{cb} + \\Gamma^a_{ce}\\Gamma^e_{db} - \\Gamma^a_{de}\\Gamma^e_{cb}",
  ricci: "R_{bd} = R^a{}_{bad}",
  ricciScalar: "R = g^{bd} R_{bd}",
  einstein: "G_{ab} = R_{ab} - \\tfrac12 R\\, g_{ab}",
  kretschmann: "K = R_{abcd} R^{abcd}",
  indices: "indices are positions in the coordinate list; only non-zero components are listed",
} as const;

const STAGES = ["validate", "inverse", "christoffel", "riemann", "ricci", "kretschmann", "display"] as const;

class Verifier {
  private readonly D: DecimalContext;
  readonly points: { values: Record<string, Decimal>; raw: CurvatureAtPoint }[] = [];
  checked = 0;
  /** Relative tolerance 10^(14 − digits): room for rounding in long raw sums. */
  private readonly tolerance: Decimal;
  constructor(metric: Metric, readonly count: number, readonly digits: number) {
    this.D = decimalContext(digits);
    this.tolerance = new this.D(10).pow(14 - digits);
    const raw = rawDerivatives(metric);
    const next = randomSource(11);
    for (let attempt = 0; attempt < count * 8 && this.points.length < count; attempt += 1) {
      const values = completeTrigValues(raw.names, randomValues(this.D, freeNamesOf(raw.names), next));
      try {
        this.points.push({ values, raw: curvatureAtPoint(this.D, raw, values) });
      } catch { /* a pole or outside the domain: draw again */ }
    }
    if (this.points.length < count) throw new Error("the curvature could not be evaluated at enough random points to verify it");
  }

  /** Is `shown` equal to the raw value at every point? */
  agrees(shown: Expr, pick: (at: CurvatureAtPoint) => Decimal): boolean {
    const tree = freezeTrig(jetify(shown));
    return this.points.every(({ values, raw }) => {
      const expected = pick(raw);
      let got: Decimal;
      try { got = evaluateDecimal(this.D, tree, { values: completeTrigValues(freeVariables(tree), values) }); } catch { return false; }
      const scale = this.D.max(1, expected.abs(), got.abs());
      return got.minus(expected).abs().lte(scale.times(this.tolerance));
    });
  }

  /** Is the raw value zero at every point (for a component the exact arithmetic found to be 0)? */
  vanishes(pick: (at: CurvatureAtPoint) => Decimal, scale: (at: CurvatureAtPoint) => Decimal): boolean {
    return this.points.every(({ raw }) => pick(raw).abs().lte(this.D.max(1, scale(raw)).times(this.tolerance)));
  }
}

function display(geo: Geometry, f: RatFun, thorough: boolean, verify: (e: Expr) => boolean): Expr {
  const candidates = [fromRatFun(geo.ring, f, "factored"), fromRatFun(geo.ring, f, "expanded")];
  if (thorough) for (const op of ["simplify", "factor"] as const) candidates.push(viaNerdamer(candidates[0], op));
  candidates.sort((a, b) => exprSize(a) - exprSize(b));
  for (const c of candidates) if (verify(c)) return c;
  throw new Error("internal error: no written form of a curvature component matched its unsimplified value");
}

/**
 * Computes the curvature sheet of a metric, one stage per step: the async
 * runner below yields between stages so progress can be shown and an
 * AbortSignal honoured; {@link computeCurvatureSync} runs it straight through.
 */
function* sheetStages(metric: Metric, options: CurvatureOptions): Generator<CurvatureProgress, CurvatureSheet> {
  const timings: Record<string, number> = {};
  const total = STAGES.length;
  let done = 0;
  let clock = performance.now();
  const start = clock;
  const tick = () => options.signal?.throwIfAborted();
  const finish = (stage: string): CurvatureProgress => {
    const now = performance.now();
    timings[stage] = Math.round((now - clock) * 100) / 100;
    clock = now;
    done += 1;
    const p = { stage, done, total };
    options.onProgress?.(p);
    tick();
    return p;
  };
  const signature = validateMetric(metric);
  yield finish("validate");
  const geo = geometryOf(metric);
  yield finish("inverse");
  const gamma = christoffel(geo, tick);
  yield finish("christoffel");
  const riem = riemann(geo, gamma, tick);
  yield finish("riemann");
  const ric = ricci(geo, riem);
  const scalar = ricciScalar(geo, ric);
  const ein = einstein(geo, ric, scalar);
  yield finish("ricci");
  const k = kretschmann(geo, riem, tick);
  yield finish("kretschmann");

  const verifier = new Verifier(metric, options.points ?? 2, options.digits ?? 25);
  const thorough = options.thorough ?? false;
  const n = geo.n;
  const list = (entries: { index: number[]; f: RatFun; pick: (at: CurvatureAtPoint) => Decimal; scale: (at: CurvatureAtPoint) => Decimal }[]): TensorComponent[] => {
    const out: TensorComponent[] = [];
    for (const { index, f, pick, scale } of entries) {
      tick();
      verifier.checked += 1;
      if (rfIsZero(f)) {
        if (!verifier.vanishes(pick, scale)) throw new Error(`internal error: component [${index.join(",")}] is exactly 0 but not numerically`);
        continue;
      }
      out.push({ index, expr: display(geo, f, thorough, (e) => verifier.agrees(e, pick)) });
    }
    return out;
  };
  const pairs = (fn: (a: number, b: number) => void) => { for (let a = 0; a < n; a += 1) for (let b = a; b < n; b += 1) fn(a, b); };
  // The size a zero component is measured against, once per tensor and point (not per component).
  const memo = new Map<string, Decimal>();
  const maxOfRaw = (xs: Decimal[]) => xs.reduce((m, x) => (x.abs().gt(m) ? x.abs() : m), xs[0].abs());
  const maxOf = (xs: () => Decimal[], key: string) => {
    let v = memo.get(key);
    if (v === undefined) { v = maxOfRaw(xs()); memo.set(key, v); }
    return v;
  };
  const pointKey = (at: CurvatureAtPoint) => String(verifier.points.findIndex((p) => p.raw === at));
  const inverseEntries: Parameters<typeof list>[0] = [];
  pairs((a, b) => inverseEntries.push({ index: [a, b], f: geo.ginv[a][b], pick: (at) => at.ginv[a][b], scale: (at) => maxOf(() => at.ginv.flat(), `g${pointKey(at)}`) }));
  const gammaEntries: Parameters<typeof list>[0] = [];
  for (let a = 0; a < n; a += 1) pairs((b, c) => gammaEntries.push({ index: [a, b, c], f: gamma[a][b][c], pick: (at) => at.christoffel[a][b][c], scale: (at) => maxOf(() => at.christoffel.flat(2), `G${pointKey(at)}`) }));
  const riemEntries: Parameters<typeof list>[0] = [];
  for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) for (let c = 0; c < n; c += 1) for (let d = c + 1; d < n; d += 1) {
    riemEntries.push({ index: [a, b, c, d], f: riem[a][b][c][d], pick: (at) => at.riemann[a][b][c][d], scale: (at) => maxOf(() => at.christoffel.flat(2), `G${pointKey(at)}`).pow(2) });
  }
  const ricciEntries: Parameters<typeof list>[0] = [];
  pairs((a, b) => ricciEntries.push({ index: [a, b], f: ric[a][b], pick: (at) => at.ricci[a][b], scale: (at) => maxOf(() => at.riemann.flat(3), `R${pointKey(at)}`) }));
  const einsteinEntries: Parameters<typeof list>[0] = [];
  pairs((a, b) => einsteinEntries.push({ index: [a, b], f: ein[a][b], pick: (at) => at.einstein[a][b], scale: (at) => maxOf(() => at.riemann.flat(3), `R${pointKey(at)}`) }));
  const scalarOf = (f: RatFun, pick: (at: CurvatureAtPoint) => Decimal) => list([{ index: [], f, pick, scale: (at) => maxOf(() => at.riemann.flat(3), `R${pointKey(at)}`).pow(2) }])[0]?.expr ?? { kind: "num", value: "0" } as Expr;

  const sheet = {
    coordinates: metric.coordinates,
    signature,
    inverseMetric: list(inverseEntries),
    christoffel: list(gammaEntries),
    riemann: list(riemEntries),
    ricci: list(ricciEntries),
    ricciScalar: scalarOf(scalar, (at) => at.ricciScalar),
    einstein: list(einsteinEntries),
    kretschmann: scalarOf(k, (at) => at.kretschmann),
    verification: { points: verifier.points.length, digits: verifier.digits, checked: verifier.checked },
    timings,
  };
  finish("display");
  timings.total = Math.round((performance.now() - start) * 100) / 100;
  return sheet;
}

/**
 * The curvature sheet of a metric, every listed component verified against the
 * unsimplified value at random points. Yields to the event loop between stages;
 * rejects with the signal's reason when aborted.
 *
 * @example
 * const sheet = await computeCurvature(metric, { onProgress: (p) => console.log(p.stage) });
 * sheet.ricci.length // 0 for Schwarzschild
 */
export async function computeCurvature(metric: Metric, options: CurvatureOptions = {}): Promise<CurvatureSheet> {
  const run = sheetStages(metric, options);
  for (;;) {
    const step = run.next();
    if (step.done) return step.value;
    await new Promise<void>((resolve) => setTimeout(resolve, 0));
    options.signal?.throwIfAborted();
  }
}

/** {@link computeCurvature} without yielding (for the CLI, workers and the bench). */
export function computeCurvatureSync(metric: Metric, options: CurvatureOptions = {}): CurvatureSheet {
  const run = sheetStages(metric, options);
  for (;;) {
    const step = run.next();
    if (step.done) return step.value;
  }
}
