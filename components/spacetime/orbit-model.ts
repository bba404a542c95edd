import { differentiate } from "@/cas/calculus/differentiate";
import type { Expr } from "@/cas/expr/types";
import { freeVariables } from "@/cas/expr/traverse";
import { curveExtrema, sampleCurve, type CurvePoint } from "@/cas/numeric/curve";
import { evaluateFloat } from "@/cas/numeric/evaluate";
import { readPlainExpr } from "@/cas/parse/plain";
import { orbitTrajectory, type OrbitTrajectory } from "@/cas/spacetime/orbit-trajectory";

/** The parts of the `potential` verb's answer the orbit panel uses (cas/api/potential.ts). */
export interface PotentialAnswer {
  readonly effectivePotential: { readonly latex: string; readonly expr: string };
  readonly perUnitMass: { readonly effectivePotential: { readonly latex: string; readonly expr: string }; readonly radialEquation: { readonly latex: string } };
  readonly A: { readonly latex: string; readonly expr: string };
  readonly B: { readonly latex: string; readonly expr: string };
}

/** The `orbits` verb's answer (cas/api/orbits.ts). */
export interface OrbitsAnswer {
  readonly photonSphere: number | number[] | null;
  readonly isco: number | number[] | null;
  readonly marginallyBound: number | number[] | null;
  readonly details: {
    readonly units: { readonly gravitationalLength: number | null };
    readonly horizon: number | null;
    readonly circularOrbits: readonly { readonly from: number; readonly to: number | null; readonly stable: boolean }[];
    readonly precession?: { readonly firstOrder: number | null; readonly numerical: number | null; readonly note?: string };
    readonly deflection?: { readonly firstOrder: number | null; readonly numerical: number | null; readonly note?: string };
  };
}

/** Names fixed to 1 in the per-unit-mass, geometric-units form (G = c = 1, per unit μ). */
const FIXED = new Set(["c", "mu"]);

/** The potential, read once: V_eff per unit mass, A(r) and A'(r) as trees, and the constants a reader can set. */
export interface OrbitModel {
  readonly potential: Expr;
  readonly A: Expr;
  readonly dA: Expr;
  /** Plain names of the constants (not r, L, c or μ), in a stable order. */
  readonly constants: readonly string[];
}

export function orbitModel(answer: PotentialAnswer): OrbitModel {
  const potential = readPlainExpr(answer.perUnitMass.effectivePotential.expr);
  const A = readPlainExpr(answer.A.expr);
  const names = new Set([...freeVariables(potential), ...freeVariables(A)]);
  const constants = [...names].filter((n) => n !== "r" && n !== "L" && !FIXED.has(n)).sort();
  return { potential, A, dA: differentiate(A, "r"), constants };
}

/** Values for every name the trees use: the constants as set, c = μ = 1. */
export function withFixed(values: Readonly<Record<string, number>>): Record<string, number> {
  return { ...values, c: 1, mu: 1 };
}

export interface PotentialCurve {
  readonly points: readonly CurvePoint[];
  readonly circular: readonly { x: number; y: number; kind: "minimum" | "maximum" }[];
}

/**
 * V_eff(r) per unit mass sampled for the plot between `from` and `to`, with its
 * minima (stable circular orbits) and maxima (unstable ones) at this L. Values
 * beyond ±`clip` are left as gaps so the interesting range stays readable.
 */
export function potentialCurve(model: OrbitModel, values: Readonly<Record<string, number>>, L: number, from: number, to: number, clip = 2): PotentialCurve {
  const sampled = sampleCurve(model.potential, "r", { values: { ...withFixed(values), L }, from, to, count: 480, spacing: "log" });
  const circular = curveExtrema(sampled);
  const points = sampled.map((p) => (p.y !== null && Math.abs(p.y) > clip ? { x: p.x, y: null } : p));
  return { points, circular };
}

/** The bound orbit through r_p = a(1 − e) and r_a = a(1 + e), integrated numerically (geometric units, c = 1). */
export function trajectoryOf(model: OrbitModel, values: Readonly<Record<string, number>>, a: number, e: number, turns: number): OrbitTrajectory {
  const env = withFixed(values);
  const at = (tree: Expr) => (r: number) => evaluateFloat(tree, { values: { ...env, r } });
  return orbitTrajectory({ A: at(model.A), dA: at(model.dA) }, 1, a, e, { turns });
}

/** A radius answer as a list (the verb gives a number, several, or null). */
export function radiiList(r: number | number[] | null): number[] {
  return r === null ? [] : Array.isArray(r) ? r : [r];
}
