import type Decimal from "decimal.js";
import type { Expr } from "../expr/types";
import { EvaluationError, type DecimalContext } from "../numeric/evaluate";
import { OutOfRangeError, type Arithmetic } from "../numeric/arithmetic";
import { compileTree, fillSlots, SlotNames, type Compiled } from "../numeric/compile";
import { freeNamesOf, freezeTrig, jetify, randomSource, randomValues } from "../simplify/probe";
import { compileRawDerivatives, curvatureAtPoint, type CurvatureAtPoint, type RawDerivatives } from "./numeric-curvature";

/**
 * The raw (unsimplified) curvature at a few random points, and checks of
 * written forms against it. Each written form is compiled once and its value
 * at each point kept by its structure, so a form shown for several components
 * is evaluated once per point. How this stays sound: cas/check/README.md,
 * "The curvature sheet's numeric check".
 *
 * @example
 * const v = new SheetVerifier(ddArithmetic, decimalContext(40), rawDerivatives(metric), 2, 1e-11);
 * v.agrees(readPlainExpr("12*r_s^2/r^6"), (at) => at.kretschmann) // true for Schwarzschild
 */
export class SheetVerifier<N> {
  readonly points: { values: Record<string, Decimal>; slots: (N | undefined)[]; raw: CurvatureAtPoint<N> }[] = [];
  checked = 0;
  readonly digits: number;
  private readonly names = new SlotNames();
  private readonly forms = new Map<string, { run: Compiled<N>; at: (N | EvaluationError)[] }>();
  /** Draws `count` usable points (values made in `D`, then held in `A`) and evaluates the raw sheet there. */
  constructor(readonly A: Arithmetic<N>, D: DecimalContext, raw: RawDerivatives, readonly count: number, readonly tolerance: number) {
    this.digits = A.digits;
    const metricAt = compileRawDerivatives(A, raw, this.names);
    const next = randomSource(11);
    for (let attempt = 0; attempt < count * 8 && this.points.length < count; attempt += 1) {
      const values = randomValues(D, freeNamesOf(raw.names), next);
      try {
        const slots: (N | undefined)[] = [];
        fillSlots(A, this.names, values, slots);
        this.points.push({ values, slots, raw: curvatureAtPoint(A, metricAt(slots as N[])) });
      } catch (err) {
        if (err instanceof OutOfRangeError) throw err;
        /* a pole or outside the domain: draw again */
      }
    }
    if (this.points.length < count) throw new Error("the curvature could not be evaluated at enough random points to verify it");
  }

  private valueAt(form: { run: Compiled<N>; at: (N | EvaluationError)[] }, i: number): N | EvaluationError {
    let v = form.at[i];
    if (v === undefined) {
      const point = this.points[i];
      if (point.slots.length < this.names.names.length) fillSlots(this.A, this.names, point.values, point.slots);
      try {
        v = form.run(point.slots as N[]);
      } catch (err) {
        if (err instanceof OutOfRangeError || !(err instanceof EvaluationError)) throw err;
        v = err;
      }
      form.at[i] = v;
    }
    return v;
  }

  /**
   * Is `shown` equal to the raw value `pick` selects, at every point, to the
   * relative tolerance? Throws an OutOfRangeError when double-double cannot tell.
   */
  agrees(shown: Expr, pick: (at: CurvatureAtPoint<N>) => N): boolean {
    const key = JSON.stringify(shown);
    let form = this.forms.get(key);
    if (!form) {
      form = { run: compileTree(this.A, freezeTrig(jetify(shown)), this.names), at: [] };
      this.forms.set(key, form);
    }
    const A = this.A;
    for (let i = 0; i < this.points.length; i += 1) {
      const got = this.valueAt(form, i);
      if (got instanceof EvaluationError) return false;
      const expected = pick(this.points[i].raw);
      const scale = A.size(expected) >= A.size(got) ? expected : got;
      if (!A.negligible(A.sub(got, expected), scale, this.tolerance)) return false;
    }
    return true;
  }

  /** Is the raw value zero at every point (for a component the exact arithmetic found to be 0)? */
  vanishes(pick: (at: CurvatureAtPoint<N>) => N, scale: (at: CurvatureAtPoint<N>) => N): boolean {
    return this.points.every(({ raw }) => this.A.negligible(pick(raw), scale(raw), this.tolerance));
  }
}
