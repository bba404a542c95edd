import type { Expr } from "../../expr/types";
import { call, deriv, differential, dot, euler, num, pi, sym } from "../../expr/build";
import { negationOf, powerOf, productOf, quotientOf, sumOf } from "../../calculus/differentiate";
import { type Poly, exponentsOf, polyContent, polyScale, polyIsZero } from "./polynomial";
import { type Q, qInv } from "./rational-number";
import type { RatFun } from "./ratfun";
import type { Atom, Factors, Ring } from "./ring";

export function atomExpr(a: Atom): Expr {
  switch (a.kind) {
    case "sym": return sym(a.name);
    case "const": return a.name === "pi" ? pi : euler;
    case "dot": return dot(a.name, a.order);
    case "differential": return differential(a.name);
    case "sin": case "cos": return call(a.kind, sym(a.arg));
    case "fn": {
      let out: Expr = call(a.fn, ...a.args.map(sym));
      a.orders.forEach((o, i) => { if (o > 0) out = deriv(out, a.args[i], o, a.args.length > 1); });
      return out;
    }
    case "opaque": return a.expr;
  }
}

function monomialExpr(ring: Ring, key: string): Expr[] {
  const out: Expr[] = [];
  exponentsOf(key).forEach((e, v) => { if (e > 0) out.push(powerOf(atomExpr(ring.atoms[v]), num(e))); });
  return out;
}

/** A polynomial as a sum of terms, leading terms first, a positive term in front when there is one. */
export function polyExpr(ring: Ring, p: Poly): Expr {
  if (polyIsZero(p)) return num(0);
  const keys = [...p.keys()].sort((a, b) => (a < b ? 1 : a > b ? -1 : 0));
  const firstPositive = keys.findIndex((k) => p.get(k)!.n > 0n);
  if (firstPositive > 0) keys.unshift(...keys.splice(firstPositive, 1));
  const terms = keys.map((k) => {
    const c = p.get(k)!;
    const mag = c.n < 0n ? -c.n : c.n;
    const mono = monomialExpr(ring, k);
    const top = productOf(mag === 1n && mono.length > 0 ? mono : [num(mag.toString()), ...mono]);
    const term = c.d === 1n ? top : quotientOf(top, num(c.d.toString()));
    return c.n < 0n ? negationOf(term) : term;
  });
  return sumOf(terms);
}

function factorsExpr(ring: Ring, factors: Factors): Expr[] {
  // Monomial factors first: r^2 (r - r_s), not (r - r_s) r^2.
  return [...factors].sort(([a], [b]) => ring.factors[a].size - ring.factors[b].size || a - b).map(([id, e]) => powerOf(polyExpr(ring, ring.factors[id]), num(e)));
}

function assemble(content: Q, top: Expr[], den: Factors, ring: Ring): Expr {
  const mag = content.n < 0n ? -content.n : content.n;
  const numerator = productOf(mag === 1n && top.length > 0 ? top : [num(mag.toString()), ...top]);
  const denominator = productOf([...(content.d === 1n ? [] : [num(content.d.toString())]), ...factorsExpr(ring, den)]);
  const out = quotientOf(numerator, denominator);
  return content.n < 0n ? negationOf(out) : out;
}

/**
 * Writes a rational function back as a tree: `"factored"` pulls the content and
 * every registered factor out of the numerator, `"expanded"` leaves the
 * numerator as one sum.
 *
 * @example
 * fromRatFun(ring, f, "factored") // c^2 r_s (r - r_s) / (2 r^3)
 */
export function fromRatFun(ring: Ring, a: RatFun, style: "factored" | "expanded"): Expr {
  if (polyIsZero(a.num)) return num(0);
  if (style === "expanded") {
    // Only the denominator is pulled out: the signs stay in the sum, so −(r − r_s) reads r_s − r.
    const scale = { n: 1n, d: polyContent(a.num).d };
    return assemble(scale, [polyExpr(ring, polyScale(a.num, qInv(scale)))], a.den, ring);
  }
  const { content, factors, rest } = ring.factorize(a.num, false);
  const top = [...factorsExpr(ring, factors)];
  if (!(rest.size === 1 && rest.has(""))) top.push(polyExpr(ring, rest));
  return assemble(content, top, a.den, ring);
}
