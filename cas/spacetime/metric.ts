import type { Expr } from "../expr/types";
import { differentialVariable } from "../expr/types";
import { mapExpr, substitute } from "../expr/traverse";
import { num, sym } from "../expr/build";
import { differentiate, productOf } from "../calculus/differentiate";
import { Ring } from "../simplify/algebra/ring";
import { toRatFun } from "../simplify/algebra/from-expr";
import { exponentsOf } from "../simplify/algebra/polynomial";
import { rationalCandidates } from "../simplify/rational-normal";
import { acceptIfEqual } from "../simplify/guard";
import type { RatFun } from "../simplify/algebra/ratfun";

/** A metric as given: coordinate names (plain identifiers) and the component trees g_ab, symmetric. */
export interface Metric {
  readonly coordinates: readonly string[];
  readonly components: readonly (readonly Expr[])[];
}

/** Raised for a metric the toolkit cannot use; the message says why, in the user's terms. */
export class MetricError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "MetricError";
  }
}

/**
 * Reads g_ab off a line element: g_aa is the coefficient of da², g_ab half the
 * coefficient of da db. Taken by differentiating the tree twice by the
 * differentials, so the components stay the raw trees the user wrote.
 *
 * @example
 * metricFromLineElement(rhsOf("ds^2 = -(1-r_s/r) c^2 dt^2 + dr^2/(1-r_s/r) + r^2 dθ^2 + r^2 sin^2θ dφ^2"), ["t","r","theta","phi"])
 */
export function metricFromLineElement(lineElement: Expr, coordinates: readonly string[]): Metric {
  checkCoordinates(coordinates);
  const asSymbols = mapExpr(lineElement, (e) => (e.kind === "differential" ? sym(differentialVariable(e.name)) : e));
  checkQuadratic(lineElement, coordinates);
  const zero: Record<string, Expr> = Object.fromEntries(coordinates.map((c) => [differentialVariable(c), num(0)]));
  const n = coordinates.length;
  const components: Expr[][] = Array.from({ length: n }, () => new Array<Expr>(n));
  for (let a = 0; a < n; a += 1) {
    const first = differentiate(asSymbols, differentialVariable(coordinates[a]));
    for (let b = a; b < n; b += 1) {
      const second = differentiate(first, differentialVariable(coordinates[b]));
      // ½ ∂²/∂da∂db leaves factors like 0.5·(…·2): keep the rational normal form when the guard accepts it.
      const g = tidy(substitute(productOf([num("0.5"), second]), zero));
      components[a][b] = g;
      components[b][a] = g;
    }
  }
  return { coordinates, components };
}

/**
 * A metric from a components matrix (symmetry is checked by {@link validateMetric}).
 *
 * @example
 * metricFromComponents([[neg(sym("c")), num(0)], [num(0), num(1)]], ["t", "x"])
 */
export function metricFromComponents(components: readonly (readonly Expr[])[], coordinates: readonly string[]): Metric {
  checkCoordinates(coordinates);
  const n = coordinates.length;
  if (components.length !== n || components.some((row) => row.length !== n)) {
    throw new MetricError(`the components matrix must be ${n}×${n}, one row and column per coordinate`);
  }
  return { coordinates, components };
}

function tidy(e: Expr): Expr {
  const candidates = rationalCandidates(e);
  const best = candidates.find((c) => acceptIfEqual(e, c));
  return best ?? e;
}

function checkCoordinates(coordinates: readonly string[]): void {
  if (coordinates.length < 2 || coordinates.length > 4) throw new MetricError("give between 2 and 4 coordinates");
  if (new Set(coordinates).size !== coordinates.length) throw new MetricError("the coordinates must be distinct");
}

function checkQuadratic(lineElement: Expr, coordinates: readonly string[]): void {
  const ring = new Ring();
  let f: RatFun;
  try {
    f = toRatFun(ring, lineElement);
  } catch (error) {
    throw new MetricError(`cannot read the line element as a quadratic form: ${(error as Error).message}`);
  }
  const isDifferential = (v: number) => ring.atoms[v].kind === "differential";
  for (const [id] of f.den) {
    if ([...ring.factors[id].keys()].some((k) => exponentsOf(k).some((e, v) => e > 0 && isDifferential(v)))) {
      throw new MetricError("a differential appears in a denominator of the line element");
    }
  }
  let any = false;
  for (const key of f.num.keys()) {
    let degree = 0;
    exponentsOf(key).forEach((e, v) => {
      if (!isDifferential(v) || e === 0) return;
      const atom = ring.atoms[v] as { name: string };
      if (!coordinates.includes(atom.name)) throw new MetricError(`d${atom.name} is not the differential of a coordinate (${coordinates.join(", ")})`);
      degree += e;
    });
    if (degree !== 2) throw new MetricError("every term of the line element must hold exactly two differentials (dt^2, dt dr, …)");
    any = true;
  }
  if (!any) throw new MetricError("the line element is zero");
}
