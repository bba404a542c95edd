import type { Expr } from "../expr/types";
import { num } from "../expr/build";
import { freeVariables, substitute } from "../expr/traverse";
import { Ring } from "../simplify/algebra/ring";
import { toRatFun } from "../simplify/algebra/from-expr";
import { rfDerivativeBy } from "../simplify/algebra/calculus";
import { exponentOf, polyIsZero } from "../simplify/algebra/polynomial";
import { type RatFun, denPoly, rfAdd, rfDiv, rfMul, rfOne, rfPoly, rfScale, rfSub } from "../simplify/algebra/ratfun";
import { q, qToNumber } from "../simplify/algebra/rational-number";
import { polyVar } from "../simplify/algebra/polynomial";
import { MetricError, type Metric } from "./metric";
import { staticSphericalParts } from "./potential";
import { lightDeflection, perihelionAdvance, type RadialFunctions } from "./orbit-integration";

export interface OrbitRequest {
  /** Numbers for every symbol of the metric except r (e.g. G, M, c or r_s). */
  readonly values: Readonly<Record<string, number>>;
  readonly definitions?: Readonly<Record<string, Expr>>;
  readonly semiMajorAxis?: number;
  readonly eccentricity?: number;
  readonly impactParameter?: number;
  readonly emitterRadius?: number;
  readonly observerRadius?: number;
}

/** A radius answer: one number, several (ascending), or null when there is none. */
export type Radii = number | number[] | null;

export interface OrbitNumbers {
  readonly units: { readonly system: "SI" | "geometric"; readonly note: string; readonly gravitationalLength: number | null };
  readonly horizon: number | null;
  readonly photonSphere: Radii;
  readonly isco: Radii;
  readonly marginallyBound: Radii;
  /** Where circular timelike orbits exist and whether they are stable (dℓ²/dr > 0). */
  readonly circularOrbits: readonly { readonly from: number; readonly to: number | null; readonly stable: boolean }[];
  readonly precessionPerOrbit?: { readonly firstOrder: number | null; readonly numerical: number | null; readonly note?: string };
  readonly deflection?: { readonly firstOrder: number | null; readonly numerical: number | null; readonly note?: string };
  /** 1 + z = sqrt(A(r_observer)/A(r_emitter)) for static emitter and observer. */
  readonly redshift?: number;
}

/** A univariate rational function in r with float coefficients, for root finding. */
interface Univariate { readonly num: number[]; readonly den: number[] }

function univariate(ring: Ring, f: RatFun, rIndex: number): Univariate {
  const coefficients = (p: Map<string, { n: bigint; d: bigint }>) => {
    const out: number[] = [];
    for (const [k, c] of p) {
      for (let v = 0; v < k.length; v += 1) if (v !== rIndex && k.charCodeAt(v) > 0) throw new MetricError(`no value was given for ${JSON.stringify(ring.atoms[v])}`);
      const e = exponentOf(k, rIndex);
      out[e] = (out[e] ?? 0) + qToNumber(c);
    }
    return Array.from(out, (x) => x ?? 0);
  };
  return { num: coefficients(f.num), den: coefficients(denPoly(ring, f.den)) };
}

const horner = (cs: number[], r: number) => cs.reduceRight((acc, c) => acc * r + c, 0);
const valueAt = (f: Univariate, r: number) => horner(f.num, r) / horner(f.den, r);

/** Positive roots of the numerator in (lo, hi), by a log-spaced scan and bisection. */
function roots(f: Univariate, lo: number, hi: number, keep: (r: number) => boolean): number[] {
  const out: number[] = [];
  const steps = 6000;
  const ratio = Math.pow(hi / lo, 1 / steps);
  let a = lo;
  let fa = horner(f.num, a);
  for (let i = 1; i <= steps; i += 1) {
    const b = lo * Math.pow(ratio, i);
    const fb = horner(f.num, b);
    if (fa === 0 || Math.sign(fa) !== Math.sign(fb)) {
      let x = a, y = b;
      for (let k = 0; k < 200; k += 1) {
        const m = (x + y) / 2;
        if (Math.sign(horner(f.num, m)) === Math.sign(horner(f.num, x))) x = m; else y = m;
      }
      const root = (x + y) / 2;
      if (keep(root) && !out.some((o) => Math.abs(o - root) <= 1e-9 * root)) out.push(root);
    }
    a = b;
    fa = fb;
  }
  return out;
}

const radii = (xs: number[]): Radii => (xs.length === 0 ? null : xs.length === 1 ? xs[0] : xs);

/**
 * The orbit panel numbers of a static, spherically symmetric metric: horizon,
 * photon sphere (d(A/r²)/dr = 0), ISCO (minimum of ℓ²(r) = c² r³A'/(2A − rA')),
 * marginally bound orbit (circular orbit with E = μc²: 2A² − 2A + rA' = 0),
 * perihelion advance, light deflection and gravitational redshift. Radii are in
 * the units of r.
 *
 * @example
 * orbitNumbers(schwarzschild, { values: { r_s: 2 } }).isco // 6
 */
export function orbitNumbers(metric: Metric, request: OrbitRequest): OrbitNumbers {
  const definitions = request.definitions ?? {};
  const given: Metric = { coordinates: metric.coordinates, components: metric.components.map((row) => row.map((e) => substitute(e, definitions))) };
  const usesC = given.components.some((row) => row.some((e) => freeVariables(e).has("c")));
  const { A, B } = staticSphericalParts(given, usesC);
  const r = metric.coordinates[1];
  const bindings: Record<string, Expr> = {};
  for (const [name, value] of Object.entries(request.values)) {
    if (name === r || name === "r") continue;
    if (!Number.isFinite(value)) throw new MetricError(`the value of ${name} must be a finite number`);
    bindings[name] = num(String(value));
  }
  const missing = [...freeVariables(A), ...freeVariables(B)].filter((v) => v !== "r" && !(v in bindings));
  if (missing.length > 0) throw new MetricError(`give a value for ${[...new Set(missing)].join(", ")}`);
  // Without a value for c the answer is in geometric units (c = 1).
  const c = request.values.c ?? 1;
  const si = usesC && request.values.c !== undefined;
  const ring = new Ring();
  const rIndex = ring.variable({ kind: "sym", name: "r" });
  const a = toRatFun(ring, substitute(A, bindings));
  const b = toRatFun(ring, substitute(B, bindings));
  const rr = rfPoly(polyVar(rIndex));
  const dA = rfDerivativeBy(ring, a, "r");
  const rdA = rfMul(ring, rr, dA);
  const circ = rfSub(ring, rfScale(a, q(2n)), rdA); // 2A − rA'
  const photon = rfSub(ring, rdA, rfScale(a, q(2n))); // ∝ d(A/r²)/dr
  const ell2 = rfDiv(ring, rfMul(ring, rfMul(ring, rr, rfMul(ring, rr, rr)), dA), circ); // ℓ²/c²
  const isco = rfDerivativeBy(ring, ell2, "r");
  const bound = rfAdd(ring, rfSub(ring, rfScale(rfMul(ring, a, a), q(2n)), rfScale(a, q(2n))), rdA);
  const U = (f: RatFun) => univariate(ring, f, rIndex);
  const uA = U(a), udA = U(dA), uCirc = U(circ), uIsco = U(isco);
  const Af = (x: number) => valueAt(uA, x);
  const dAf = (x: number) => valueAt(udA, x);

  // gravitational length m = ½ lim r(1 − A), when A → 1 like 1 − 2m/r
  const h = U(rfMul(ring, rr, rfSub(ring, rfOne(), a)));
  const degree = (cs: number[]) => { let d = cs.length - 1; while (d >= 0 && cs[d] === 0) d -= 1; return d; };
  const m = degree(h.num) === degree(h.den) ? h.num[degree(h.num)] / h.den[degree(h.den)] / 2 : null;
  const scale = m !== null && m > 0 ? m : 1;
  const lo = scale * 1e-6;
  const hi = scale * 1e8;
  const horizons = roots(U(a), lo, hi, () => true);
  const horizon = horizons.length > 0 ? horizons[horizons.length - 1] : null;
  const outside = (x: number) => (horizon === null || x > horizon * (1 + 1e-12)) && Af(x) > 0;
  const timelikeCircular = (x: number) => outside(x) && valueAt(uCirc, x) > 0 && dAf(x) > 0;
  const photonSphere = roots(U(photon), lo, hi, outside);
  const iscos = roots(uIsco, lo, hi, timelikeCircular);
  const marginallyBound = roots(U(bound), lo, hi, timelikeCircular);

  // stability bands between the roots of dℓ²/dr, inside the region of circular orbits
  const circularOrbits: { from: number; to: number | null; stable: boolean }[] = [];
  const start = photonSphere.length > 0 ? photonSphere[photonSphere.length - 1] : horizon ?? lo;
  const cuts = [start, ...iscos.filter((x) => x > start), null];
  for (let i = 0; i + 1 < cuts.length; i += 1) {
    const from = cuts[i]!;
    const to = cuts[i + 1];
    const probe = to === null ? from * 2 : Math.sqrt(from * to);
    if (!timelikeCircular(probe)) continue;
    circularOrbits.push({ from, to, stable: valueAt(uIsco, probe) > 0 });
  }

  const f: RadialFunctions = { A: Af, dA: dAf };
  const abOne = polyIsZero(rfSub(ring, rfMul(ring, a, b), rfOne()).num);
  const out: { -readonly [K in keyof OrbitNumbers]: OrbitNumbers[K] } = {
    units: {
      system: si ? "SI" : "geometric",
      note: si
        ? "radii in the units of r (metres when G, M, c are SI); angles in radians; m = GM/c² is the gravitational length"
        : "geometric units (G = c = 1): radii in the units of r; angles in radians",
      gravitationalLength: m,
    },
    horizon,
    photonSphere: radii(photonSphere),
    isco: radii(iscos),
    marginallyBound: radii(marginallyBound),
    circularOrbits,
  };
  if (request.semiMajorAxis !== undefined && request.eccentricity !== undefined) {
    const { semiMajorAxis: sa, eccentricity: e } = request;
    if (!(e >= 0 && e < 1) || !(sa > 0)) throw new MetricError("a bound orbit needs a > 0 and 0 ≤ e < 1");
    let numerical: number | null = null;
    let note: string | undefined;
    if (abOne) numerical = perihelionAdvance(f, c, sa, e);
    else note = "the numerical orbit integration needs A·B = 1";
    out.precessionPerOrbit = { firstOrder: m !== null ? (6 * Math.PI * m) / (sa * (1 - e * e)) : null, numerical, note };
  }
  if (request.impactParameter !== undefined) {
    const bImpact = request.impactParameter;
    if (!(bImpact > 0)) throw new MetricError("the impact parameter must be positive");
    out.deflection = {
      firstOrder: m !== null ? (4 * m) / bImpact : null,
      numerical: abOne ? lightDeflection(f, bImpact) : null,
      note: abOne ? undefined : "the numerical ray integration needs A·B = 1",
    };
  }
  if (request.emitterRadius !== undefined && request.observerRadius !== undefined) {
    const ae = Af(request.emitterRadius);
    const ao = Af(request.observerRadius);
    if (!(ae > 0 && ao > 0)) throw new MetricError("both radii must be outside the horizon (A > 0)");
    out.redshift = Math.sqrt(ao / ae) - 1;
  }
  return out;
}
