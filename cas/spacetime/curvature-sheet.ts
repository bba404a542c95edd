import type { Expr } from "../expr/types";
import { exprSize } from "../expr/traverse";
import { decimalContext } from "../numeric/evaluate";
import { ddArithmetic, decimalArithmetic, OutOfRangeError } from "../numeric/arithmetic";
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
import { rawDerivatives, type CurvatureAtPoint } from "./numeric-curvature";
import { SheetVerifier } from "./sheet-verifier";

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
  /** Points each form was checked at, digits of the arithmetic, relative tolerance of a check, components checked. */
  readonly verification: { readonly points: number; readonly digits: number; readonly tolerance: number; readonly checked: number };
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
  /** Random points each component is checked at (default 2). */
  readonly points?: number;
  /**
   * Check in decimal.js at this many digits, with a relative tolerance of 10^(14 − digits).
   * Default: double-double (31 digits) with a tolerance of 1e-11, decimal.js at 32 digits
   * when a value leaves double-double's range.
   */
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

/**
 * Relative tolerance of every check, 1e-11: twenty orders of magnitude above
 * double-double rounding, room for the cancellation in long raw sums (see
 * cas/check/README.md, "The curvature sheet's numeric check").
 */
const DEFAULT_TOLERANCE = 1e-11;
/** decimal.js digits when double-double's range does not suffice (one more than double-double carries). */
const FALLBACK_DIGITS = 32;

function display(geo: Geometry, f: RatFun, thorough: boolean, verify: (e: Expr) => boolean): Expr {
  const candidates = [fromRatFun(geo.ring, f, "factored"), fromRatFun(geo.ring, f, "expanded")];
  if (thorough) for (const op of ["simplify", "factor"] as const) candidates.push(viaNerdamer(candidates[0], op));
  candidates.sort((a, b) => exprSize(a) - exprSize(b));
  for (const c of candidates) if (verify(c)) return c;
  throw new Error("internal error: no written form of a curvature component matched its unsimplified value");
}

interface ExactSheet {
  readonly geo: Geometry;
  readonly gamma: RatFun[][][];
  readonly riem: RatFun[][][][];
  readonly ric: RatFun[][];
  readonly scalar: RatFun;
  readonly ein: RatFun[][];
  readonly k: RatFun;
}

interface VerifiedSheet {
  readonly components: Pick<CurvatureSheet, "inverseMetric" | "christoffel" | "riemann" | "ricci" | "ricciScalar" | "einstein" | "kretschmann">;
  readonly verification: CurvatureSheet["verification"];
}

type Entry<N> = { index: number[]; f: RatFun; pick: (at: CurvatureAtPoint<N>) => N; scale: (at: CurvatureAtPoint<N>) => N };

/** Writes every component of the exact sheet in its shortest verified form; zero components are checked to vanish. */
function verifiedSheet<N>(verifier: SheetVerifier<N>, exact: ExactSheet, thorough: boolean, tick: () => void): VerifiedSheet {
  const { geo, gamma, riem, ric, scalar, ein, k } = exact;
  const A = verifier.A;
  const n = geo.n;
  const list = (entries: Entry<N>[]): TensorComponent[] => {
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
  const memo = new Map<CurvatureAtPoint<N>, Map<string, N>>();
  const maxOf = (at: CurvatureAtPoint<N>, key: string, xs: () => N[]) => {
    let byTensor = memo.get(at);
    if (!byTensor) memo.set(at, (byTensor = new Map()));
    let v = byTensor.get(key);
    if (v === undefined) {
      v = A.abs(xs().reduce((m, x) => (A.size(x) > A.size(m) ? x : m)));
      byTensor.set(key, v);
    }
    return v;
  };
  const ginvSize = (at: CurvatureAtPoint<N>) => maxOf(at, "g", () => at.ginv.flat());
  const gammaSize = (at: CurvatureAtPoint<N>) => maxOf(at, "G", () => at.christoffel.flat(2));
  const gammaSizeSquared = (at: CurvatureAtPoint<N>) => maxOf(at, "G2", () => [A.mul(gammaSize(at), gammaSize(at))]);
  const riemannSize = (at: CurvatureAtPoint<N>) => maxOf(at, "R", () => at.riemann.flat(3));
  const riemannSizeSquared = (at: CurvatureAtPoint<N>) => maxOf(at, "R2", () => [A.mul(riemannSize(at), riemannSize(at))]);
  const inverseEntries: Entry<N>[] = [];
  pairs((a, b) => inverseEntries.push({ index: [a, b], f: geo.ginv[a][b], pick: (at) => at.ginv[a][b], scale: ginvSize }));
  const gammaEntries: Entry<N>[] = [];
  for (let a = 0; a < n; a += 1) pairs((b, c) => gammaEntries.push({ index: [a, b, c], f: gamma[a][b][c], pick: (at) => at.christoffel[a][b][c], scale: gammaSize }));
  const riemEntries: Entry<N>[] = [];
  for (let a = 0; a < n; a += 1) for (let b = 0; b < n; b += 1) for (let c = 0; c < n; c += 1) for (let d = c + 1; d < n; d += 1) {
    riemEntries.push({ index: [a, b, c, d], f: riem[a][b][c][d], pick: (at) => at.riemann[a][b][c][d], scale: gammaSizeSquared });
  }
  const ricciEntries: Entry<N>[] = [];
  pairs((a, b) => ricciEntries.push({ index: [a, b], f: ric[a][b], pick: (at) => at.ricci[a][b], scale: riemannSize }));
  const einsteinEntries: Entry<N>[] = [];
  pairs((a, b) => einsteinEntries.push({ index: [a, b], f: ein[a][b], pick: (at) => at.einstein[a][b], scale: riemannSize }));
  // R = g^{bd} R^a_{bad}: a zero R is measured against the size of what it sums.
  const scalarSize = (at: CurvatureAtPoint<N>) => maxOf(at, "gR", () => [A.mul(ginvSize(at), riemannSize(at))]);
  const scalarOf = (f: RatFun, pick: (at: CurvatureAtPoint<N>) => N, scale: Entry<N>["scale"]) => list([{ index: [], f, pick, scale }])[0]?.expr ?? ({ kind: "num", value: "0" } as Expr);
  const components = {
    inverseMetric: list(inverseEntries),
    christoffel: list(gammaEntries),
    riemann: list(riemEntries),
    ricci: list(ricciEntries),
    ricciScalar: scalarOf(scalar, (at) => at.ricciScalar, scalarSize),
    einstein: list(einsteinEntries),
    kretschmann: scalarOf(k, (at) => at.kretschmann, riemannSizeSquared),
  };
  return { components, verification: { points: verifier.points.length, digits: verifier.digits, tolerance: verifier.tolerance, checked: verifier.checked } };
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

  const exact = { geo, gamma, riem, ric, scalar, ein, k };
  const thorough = options.thorough ?? false;
  const raw = rawDerivatives(metric);
  const count = options.points ?? 2;
  let verified: VerifiedSheet | null = null;
  // Double-double unless digits are asked for; decimal.js when a value leaves double-double's range.
  if (options.digits === undefined) {
    try {
      verified = verifiedSheet(new SheetVerifier(ddArithmetic, decimalContext(40), raw, count, DEFAULT_TOLERANCE), exact, thorough, tick);
    } catch (err) {
      if (!(err instanceof OutOfRangeError)) throw err;
    }
  }
  if (verified === null) {
    const digits = options.digits ?? FALLBACK_DIGITS;
    const D = decimalContext(digits);
    const tolerance = options.digits === undefined ? DEFAULT_TOLERANCE : 10 ** (14 - digits);
    verified = verifiedSheet(new SheetVerifier(decimalArithmetic(D), D, raw, count, tolerance), exact, thorough, tick);
  }

  const sheet = {
    coordinates: metric.coordinates,
    signature,
    ...verified.components,
    verification: verified.verification,
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
