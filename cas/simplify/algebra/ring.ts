import type { Expr } from "../../expr/types";
import {
  type Poly, accumulate, exponentOf, exponentsOf, monomialKey, polyDivExact, polyKey, polyContent,
  polyScale, polyVar, polyMonomialContent, polyConstant, polyIsZero,
} from "./polynomial";
import { Q, q, qInv, Q_ONE, qMul } from "./rational-number";

/**
 * What a polynomial variable stands for. Besides plain symbols, sin and cos of a
 * symbol are separate variables tied by sin² + cos² = 1; an undetermined
 * function and each of its partial derivatives is a variable; anything the
 * rational arithmetic cannot look into (sqrt, exp, a power with a symbolic
 * exponent) is an opaque variable carrying its tree.
 */
export type Atom =
  | { readonly kind: "sym"; readonly name: string }
  | { readonly kind: "const"; readonly name: "pi" | "e" }
  | { readonly kind: "dot"; readonly name: string; readonly order: number }
  | { readonly kind: "differential"; readonly name: string }
  | { readonly kind: "sin" | "cos"; readonly arg: string }
  | { readonly kind: "fn"; readonly fn: string; readonly args: readonly string[]; readonly orders: readonly number[] }
  | { readonly kind: "opaque"; readonly expr: Expr };

export function atomKey(a: Atom): string {
  switch (a.kind) {
    case "sym": return `s:${a.name}`;
    case "const": return `k:${a.name}`;
    case "dot": return `d:${a.name}:${a.order}`;
    case "differential": return `D:${a.name}`;
    case "sin": case "cos": return `${a.kind}:${a.arg}`;
    case "fn": return `f:${a.fn}(${a.args.join(",")})[${a.orders.join(",")}]`;
    case "opaque": return `o:${JSON.stringify(a.expr)}`;
  }
}

/** A denominator: registered irreducible-enough factors and their exponents. */
export type Factors = Map<number, number>;

/**
 * The shared context of a computation: the variables in use, the sin/cos pairs
 * to reduce, and the registry of denominator factors. Every rational function
 * of one computation must come from the same ring.
 *
 * @example
 * const ring = new Ring();
 * const r = ring.variable({ kind: "sym", name: "r" });
 */
export class Ring {
  readonly atoms: Atom[] = [];
  private readonly atomIndex = new Map<string, number>();
  /** cos variable → its sin variable. */
  private readonly sinOfCos = new Map<number, number>();
  readonly factors: Poly[] = [];
  private readonly factorIndex = new Map<string, number>();

  variable(a: Atom): number {
    const key = atomKey(a);
    const known = this.atomIndex.get(key);
    if (known !== undefined) return known;
    const index = this.atoms.length;
    this.atoms.push(a);
    this.atomIndex.set(key, index);
    if (a.kind === "sin" || a.kind === "cos") {
      const other = this.variable({ kind: a.kind === "sin" ? "cos" : "sin", arg: a.arg });
      if (a.kind === "cos") this.sinOfCos.set(index, other);
      else this.sinOfCos.set(other, index);
    }
    return index;
  }

  hasTrig(): boolean {
    return this.sinOfCos.size > 0;
  }

  /** Rewrites cos² as 1 − sin² so every polynomial has cos-degree ≤ 1: then zero is recognised exactly. */
  reduce(p: Poly): Poly {
    if (this.sinOfCos.size === 0) return p;
    let out = p;
    for (const [ci, si] of this.sinOfCos) {
      let needs = false;
      for (const k of out.keys()) if (exponentOf(k, ci) >= 2) { needs = true; break; }
      if (!needs) continue;
      const next: Poly = new Map();
      for (const [k, c] of out) {
        const e = exponentOf(k, ci);
        if (e < 2) { accumulate(next, k, c); continue; }
        const half = Math.floor(e / 2);
        const codes = exponentsOf(k);
        codes[ci] = e - 2 * half;
        // c^e = c^(e mod 2) (1 - s^2)^half, expanded binomially
        let binom = 1n;
        for (let j = 0; j <= half; j += 1) {
          const withS = [...codes];
          while (withS.length <= si) withS.push(0);
          withS[si] += 2 * j;
          accumulate(next, monomialKey(withS), qMul(c, q(j % 2 === 0 ? binom : -binom)));
          binom = (binom * BigInt(half - j)) / BigInt(j + 1);
        }
      }
      out = next;
    }
    return out;
  }

  /** Registers a primitive polynomial as a denominator factor and returns its id. */
  factorId(p: Poly): number {
    const key = polyKey(p);
    const known = this.factorIndex.get(key);
    if (known !== undefined) return known;
    this.factors.push(p);
    this.factorIndex.set(key, this.factors.length - 1);
    return this.factors.length - 1;
  }

  /**
   * Splits p into content × registered factors × a rest no registered factor
   * divides (monomial parts become single-variable factors).
   */
  factorize(p: Poly, register: boolean): { content: Q; factors: Factors; rest: Poly } {
    const factors: Factors = new Map();
    if (polyIsZero(p)) return { content: q(0n), factors, rest: new Map() };
    const content = polyContent(p);
    let rest = polyScale(p, qInv(content));
    const mono = polyMonomialContent(rest);
    if (mono.length > 0) {
      const exps = exponentsOf(mono);
      exps.forEach((e, v) => { if (e > 0) factors.set(this.factorId(polyVar(v)), e); });
      rest = polyDivExact(rest, new Map([[mono, Q_ONE]]))!;
    }
    if (polyConstant(rest) === null) {
      for (let id = 0; id < this.factors.length; id += 1) {
        const f = this.factors[id];
        if (f.size === 1) continue;
        for (;;) {
          const quotient = polyDivExact(rest, f);
          if (quotient === null) break;
          rest = quotient;
          factors.set(id, (factors.get(id) ?? 0) + 1);
        }
        if (polyConstant(rest) !== null) break;
      }
    }
    const restConst = polyConstant(rest);
    if (restConst !== null) return { content: qMul(content, restConst), factors, rest: new Map([["", Q_ONE]]) };
    if (register) {
      const c = polyContent(rest);
      const primitive = polyScale(rest, qInv(c));
      const id = this.factorId(primitive);
      factors.set(id, (factors.get(id) ?? 0) + 1);
      return { content: qMul(content, c), factors, rest: new Map([["", Q_ONE]]) };
    }
    return { content, factors, rest };
  }
}
