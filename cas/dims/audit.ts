import type { Expr, Statement } from "../expr/types";
import { isBuiltinFunction } from "../expr/types";
import { neg } from "../expr/build";
import { freeVariables } from "../expr/traverse";
import { evaluateFloat } from "../numeric/evaluate";
import { signedTerms } from "../numeric/residual";
import {
  BUILTIN_DIMENSIONS, DIMENSIONLESS, formatDimension, multiplyDimensions, powerOfDimension, sameDimension, type Dimension,
} from "./dimension";

/** Declared dimensions by plain identifier (null: declared without a dimension) and the curve parameter dots refer to. */
export interface DimensionEnvironment {
  readonly symbols: ReadonlyMap<string, Dimension | null>;
  readonly parameter: string;
}

export type DimensionOutcome =
  | { readonly kind: "known"; readonly dimension: Dimension }
  | { readonly kind: "unknown"; readonly symbols: readonly string[] }
  | { readonly kind: "invalid"; readonly message: string };

const known = (dimension: Dimension): DimensionOutcome => ({ kind: "known", dimension });

function lookup(name: string, env: DimensionEnvironment): DimensionOutcome {
  const declared = env.symbols.get(name);
  if (declared) return known(declared);
  if (declared === undefined && BUILTIN_DIMENSIONS[name]) return known(BUILTIN_DIMENSIONS[name]);
  return { kind: "unknown", symbols: [name] };
}

/** Combines outcomes: the first invalid wins, then unknowns pool their symbols, else `f` of the dimensions. */
function combine(parts: DimensionOutcome[], f: (ds: Dimension[]) => DimensionOutcome): DimensionOutcome {
  const invalid = parts.find((p) => p.kind === "invalid");
  if (invalid) return invalid;
  const unknown = parts.flatMap((p) => (p.kind === "unknown" ? p.symbols : []));
  if (unknown.length) return { kind: "unknown", symbols: [...new Set(unknown)] };
  return f(parts.map((p) => (p as { dimension: Dimension }).dimension));
}

function constantNumber(e: Expr): number | null {
  if (freeVariables(e).size > 0) return null;
  try { return evaluateFloat(e, { values: {} }); } catch { return null; }
}

const isZeroLiteral = (e: Expr) => e.kind === "num" && Number(e.value) === 0;

/**
 * The dimension of a tree from the declared dimensions: sums must agree,
 * functions other than sqrt/abs need dimensionless arguments, a dotted symbol
 * has its symbol's dimension over the parameter's. Never guesses: a symbol with
 * no declared dimension makes the result unknown (G and c are built in).
 *
 * @example
 * dimensionOf(parsePlain("G*M/(c^2*r)"), env) // { kind: "known", dimension: dimensionless }
 */
export function dimensionOf(e: Expr, env: DimensionEnvironment): DimensionOutcome {
  const rec = (x: Expr): DimensionOutcome => dimensionOf(x, env);
  switch (e.kind) {
    case "num": case "const": return known(DIMENSIONLESS);
    case "sym": return lookup(e.name, env);
    case "differential": return lookup(e.name, env);
    case "dot": return combine([lookup(e.name, env), lookup(env.parameter, env)], ([x, p]) => known(multiplyDimensions(x, powerOfDimension(p, -e.order))));
    case "neg": return rec(e.arg);
    case "add": {
      const parts = e.terms.filter((t) => !isZeroLiteral(t)).map(rec);
      if (parts.length === 0) return known(DIMENSIONLESS);
      return combine(parts, (ds) => {
        const odd = ds.find((d) => !sameDimension(d, ds[0]));
        return odd ? { kind: "invalid", message: `a sum adds ${formatDimension(ds[0])} to ${formatDimension(odd)}` } : known(ds[0]);
      });
    }
    case "mul": return combine(e.factors.map(rec), (ds) => known(ds.reduce(multiplyDimensions, DIMENSIONLESS)));
    case "div": return combine([rec(e.num), rec(e.den)], ([n, d]) => known(multiplyDimensions(n, powerOfDimension(d, -1))));
    case "pow": {
      const n = constantNumber(e.exp);
      if (n !== null) return combine([rec(e.base)], ([b]) => known(powerOfDimension(b, n)));
      return combine([rec(e.base), rec(e.exp)], ([b, x]) => {
        if (!sameDimension(x, DIMENSIONLESS)) return { kind: "invalid", message: `an exponent has dimension ${formatDimension(x)}` };
        if (!sameDimension(b, DIMENSIONLESS)) return { kind: "invalid", message: `${formatDimension(b)} is raised to a symbolic power` };
        return known(DIMENSIONLESS);
      });
    }
    case "call": {
      if (!isBuiltinFunction(e.fn)) return lookup(e.fn, env);
      const args = e.args.map(rec);
      if (e.fn === "sqrt") return combine(args, ([a]) => known(powerOfDimension(a, 0.5)));
      if (e.fn === "abs") return combine(args, ([a]) => known(a));
      return combine(args, (ds) => {
        const bad = ds.find((d) => !sameDimension(d, DIMENSIONLESS));
        return bad ? { kind: "invalid", message: `the argument of ${e.fn} has dimension ${formatDimension(bad)}; it must be dimensionless` } : known(DIMENSIONLESS);
      });
    }
    case "deriv": return combine([rec(e.of), lookup(e.by, env)], ([o, b]) => known(multiplyDimensions(o, powerOfDimension(b, -e.order))));
    case "limit": return rec(e.of);
  }
}

export interface AuditedTerm {
  readonly term: Expr;
  readonly outcome: DimensionOutcome;
}

export interface Audit {
  readonly status: "consistent" | "inconsistent" | "unknown";
  readonly terms: readonly AuditedTerm[];
  /** Index of the term that disagrees with the most common dimension. */
  readonly odd?: number;
  readonly unknownSymbols: readonly string[];
  readonly problems: readonly string[];
}

/**
 * The dimension audit of a relation or expression: every top-level additive
 * term of both sides with its dimension, and whether they agree. Literal
 * zeros agree with anything.
 *
 * @example
 * auditStatement(parsePlain("E = mu*c^2 + G*M*mu/r"), env).status // "consistent"
 */
export function auditStatement(s: Statement, env: DimensionEnvironment): Audit {
  const sides = s.kind === "relation" ? [...signedTerms(s.lhs), ...signedTerms(s.rhs)] : signedTerms(s);
  const terms: AuditedTerm[] = sides.map(({ sign, term }) => ({ term: sign < 0 ? neg(term) : term, outcome: dimensionOf(term, env) }));
  const problems = terms.flatMap((t) => (t.outcome.kind === "invalid" ? [t.outcome.message] : []));
  const unknownSymbols = [...new Set(terms.flatMap((t) => (t.outcome.kind === "unknown" ? t.outcome.symbols : [])))];
  const counted = terms
    .map((t, index) => ({ index, zero: isZeroLiteral(t.term), outcome: t.outcome }))
    .filter((t): t is { index: number; zero: boolean; outcome: { kind: "known"; dimension: Dimension } } => t.outcome.kind === "known" && !t.zero);
  const groups: { dimension: Dimension; indices: number[] }[] = [];
  for (const t of counted) {
    const g = groups.find((x) => sameDimension(x.dimension, t.outcome.dimension));
    if (g) g.indices.push(t.index); else groups.push({ dimension: t.outcome.dimension, indices: [t.index] });
  }
  groups.sort((a, b) => b.indices.length - a.indices.length);
  const disagree = groups.length > 1;
  const odd = disagree ? Math.min(...groups.slice(1).flatMap((g) => g.indices)) : problems.length ? terms.findIndex((t) => t.outcome.kind === "invalid") : undefined;
  const status = disagree || problems.length ? "inconsistent" : unknownSymbols.length ? "unknown" : "consistent";
  return { status, terms, odd: odd === undefined || odd < 0 ? undefined : odd, unknownSymbols, problems };
}
