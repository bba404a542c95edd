import type { Expr, Relation, Statement } from "../expr/types";
import { dotVariable, differentialVariable, isBuiltinFunction } from "../expr/types";
import { exprEquals, freeVariables, mapExpr } from "../expr/traverse";
import { dot, mul, num, sym } from "../expr/build";
import { differentiate } from "../calculus/differentiate";
import { concreteFunction, type ConcreteFunction } from "../numeric/concrete-functions";
import type { RandomStream } from "../numeric/random";
import { Undecidable } from "./errors";
import { bindVariables, flatten, mapStatement, movingNames, signedVariables, variableOf, walkStatement } from "./variables";

/** A step's context after reading: definitions and assumptions as trees, names as plain identifiers. */
export interface ParsedContext {
  readonly definitions: readonly Relation[];
  readonly assumptions: readonly Relation[];
  /** The curve parameter, e.g. "tau". */
  readonly parameter: string;
  /** Coordinates that depend on the parameter; those seen dotted or as differentials are added. */
  readonly coordinates?: readonly string[];
}

/** Everything the numeric stages need, with dots/differentials flattened to symbols and derivatives carried out. */
export interface PreparedProblem {
  readonly statements: Statement[];
  /** Definitions that could not be used as substitutions (not of the form `symbol = …`): they constrain the sample points. */
  readonly constraints: Relation[];
  /** Assumptions `v = value` (θ = π/2), applied as fixed values at every point. */
  readonly fixed: { variable: string; value: Expr }[];
  /** Inequality assumptions (r > r_s) and equalities that fix nothing. */
  readonly conditions: Relation[];
  readonly signed: Set<string>;
  /** Formulas of the concrete functions standing in for undetermined ones. */
  readonly functions: Record<string, string>;
  /** Variables the sampler must not solve for (the parameter's differential). */
  readonly keep: Set<string>;
}

interface Macro { params: string[]; body: Expr }

/** Splits definitions into substitutions (`E = …`, `V(r) = …`) and the rest. */
function readDefinitions(definitions: readonly Relation[]): { bindings: Map<string, Expr>; macros: Map<string, Macro>; implicit: Relation[] } {
  const bindings = new Map<string, Expr>();
  const macros = new Map<string, Macro>();
  const implicit: Relation[] = [];
  for (const d of definitions) {
    const name = d.op === "=" ? variableOf(d.lhs) : null;
    // The same definition twice (in the context and cited for a substitution) says nothing new;
    // kept as a constraint it would read `X = X` and leave the sampler no variable to solve for.
    if (name !== null && bindings.has(name) && exprEquals(bindings.get(name)!, d.rhs)) continue;
    if (name !== null && !bindings.has(name)) {
      bindings.set(name, d.rhs);
      continue;
    }
    if (d.op === "=" && d.lhs.kind === "call" && !isBuiltinFunction(d.lhs.fn) && d.lhs.args.every((a) => a.kind === "sym")) {
      const params = d.lhs.args.map((a) => (a as { name: string }).name);
      macros.set(d.lhs.fn, { params, body: d.rhs });
      if (!bindings.has(d.lhs.fn)) bindings.set(d.lhs.fn, d.rhs); // the bare name V means V(r) too
      continue;
    }
    implicit.push(d);
  }
  return { bindings, macros, implicit };
}

/**
 * Substitutes the context's definitions (`f = 1 - r_s/r`, `V(r) = …`) into a tree, so a
 * Lagrangian written with f is differentiated as the function of r it stands for.
 *
 * @example
 * expandContextDefinitions(parsePlain("f*c^2*t_dot^2"), context) // (1 - r_s/r)*c^2*t_dot^2
 */
export function expandContextDefinitions(e: Expr, context: ParsedContext): Expr {
  const { bindings, macros } = readDefinitions(context.definitions);
  assertNotCircular(bindings);
  return expandDefinitions(e, bindings, macros);
}

/** Throws when definitions refer to themselves through a chain (E → L → E). */
export function assertNotCircular(bindings: ReadonlyMap<string, Expr>): void {
  const state = new Map<string, "visiting" | "done">();
  const visit = (name: string, path: string[]) => {
    if (state.get(name) === "done") return;
    if (state.get(name) === "visiting") throw new Undecidable(`circular definitions: ${[...path, name].join(" → ")}`);
    state.set(name, "visiting");
    for (const v of freeVariablesOf(bindings.get(name)!)) if (bindings.has(v)) visit(v, [...path, name]);
    state.set(name, "done");
  };
  for (const name of bindings.keys()) visit(name, []);
}

function freeVariablesOf(e: Expr): Set<string> {
  const out = freeVariables(e);
  mapExpr(e, (n) => { if (n.kind === "call") out.add(n.fn); return n; });
  return out;
}

/** Substitutes definitions until none of the defined names is left (definitions were checked acyclic, so this ends). */
function expandDefinitions(e: Expr, bindings: ReadonlyMap<string, Expr>, macros: ReadonlyMap<string, Macro>): Expr {
  for (let round = 0; round <= bindings.size + macros.size; round += 1) {
    const next = mapExpr(bindVariables(e, bindings), (n) => {
      if (n.kind !== "call") return n;
      const m = macros.get(n.fn);
      if (!m || m.params.length !== n.args.length) return n;
      return bindVariables(m.body, new Map(m.params.map((p, i) => [p, n.args[i]])));
    });
    if (JSON.stringify(next) === JSON.stringify(e)) return next;
    e = next;
  }
  return e;
}

/** Replaces every undetermined function by one random concrete function per name, the same on both sides. */
function concretize(e: Expr, registry: Map<string, { f: ConcreteFunction; arity: number }>, rng: RandomStream): Expr {
  return mapExpr(e, (n) => {
    if (n.kind !== "call" || isBuiltinFunction(n.fn)) return n;
    let entry = registry.get(n.fn);
    if (!entry) {
      entry = { f: concreteFunction(n.args.length, rng), arity: n.args.length };
      registry.set(n.fn, entry);
    } else if (entry.arity !== n.args.length) {
      throw new Undecidable(`the function ${n.fn} is used with different numbers of arguments`);
    }
    return entry.f.apply(n.args);
  });
}

/**
 * Carries out every Leibniz derivative; by the parameter it is the total
 * derivative along the curve, by a dotted variable (∂L/∂ṙ, read as by `r_dot`)
 * a partial derivative with the dots held as independent variables.
 */
export function lowerDerivatives(e: Expr, parameter: string, coordinates: readonly string[]): Expr {
  const dotted = new Map<string, Expr>();
  for (const x of coordinates) for (let order = 1; order <= 4; order += 1) dotted.set(dotVariable(x, order), dot(x, order));
  return mapExpr(e, (n) => {
    if (n.kind !== "deriv") return n;
    let out = n.of;
    for (let i = 0; i < n.order; i += 1) {
      try {
        if (n.by === parameter) out = differentiate(out, n.by, { coordinates });
        else if (dotted.has(n.by)) out = bindVariables(differentiate(flatten(out), n.by), dotted);
        else out = differentiate(out, n.by);
      } catch (err) {
        throw new Undecidable(err instanceof Error ? err.message : String(err));
      }
    }
    return out;
  });
}

/** Replaces each differential dx by ẋ dτ once a step mixes differentials and dotted symbols (dividing a line element by dτ²). */
function linkDifferentials(parameter: string, moving: Set<string>): Map<string, Expr> {
  const links = new Map<string, Expr>();
  for (const x of moving) if (x !== parameter) links.set(differentialVariable(x), mul(sym(dotVariable(x, 1)), sym(differentialVariable(parameter))));
  return links;
}

/** True for `X = …` where X is a compound expression (ds², dV/dr), not a name or a function `F(r)`. */
function isRewrite(r: Relation): boolean {
  if (r.op !== "=" || variableOf(r.lhs) !== null || r.lhs.kind === "num") return false;
  return !(r.lhs.kind === "call" && !isBuiltinFunction(r.lhs.fn) && r.lhs.args.every((a) => a.kind === "sym"));
}

/**
 * Substituting `ds^2 = -c^2 d\tau^2` or `dV/dr = 0` means replacing that expression where it is
 * written. As a constraint it would ask the sampler for a real ds with ds² < 0, or share every
 * variable with the step. A relation whose left side occurs nowhere stays a constraint.
 */
function applyRewrites(statements: readonly Statement[], relations: readonly Relation[]): { statements: Statement[]; unused: Relation[] } {
  let out = [...statements];
  const unused: Relation[] = [];
  for (const r of relations) {
    if (!isRewrite(r)) {
      unused.push(r);
      continue;
    }
    let hit = false;
    const replace = (e: Expr) => mapExpr(e, (n) => {
      if (!exprEquals(n, r.lhs)) return n;
      hit = true;
      return r.rhs;
    });
    out = out.map((s) => mapStatement(s, replace));
    if (!hit) unused.push(r);
  }
  return { statements: out, unused };
}

/**
 * Turns read statements into a problem the numeric stages can sample:
 * definitions substituted, undetermined functions made concrete, derivatives
 * carried out, dots and differentials flattened to symbols, assumptions split
 * into fixed values and conditions.
 *
 * @example
 * prepareProblem([from, to], context, rng).statements // [from', to'] over plain symbols
 */
export function prepareProblem(given: readonly Statement[], context: ParsedContext, rng: RandomStream, extraDefinitions: readonly Relation[] = []): PreparedProblem {
  const { statements, unused } = applyRewrites(given, extraDefinitions);
  const { bindings, macros, implicit } = readDefinitions([...unused, ...context.definitions]);
  assertNotCircular(bindings);
  const everything: Statement[] = [...statements, ...implicit, ...context.assumptions, ...bindings.values()];
  const moving = movingNames(everything);
  for (const c of context.coordinates ?? []) moving.add(c);
  moving.delete(context.parameter);
  const coordinates = [...moving];
  const registry = new Map<string, { f: ConcreteFunction; arity: number }>();

  const stage = (e: Expr) => lowerDerivatives(concretize(expandDefinitions(e, bindings, macros), registry, rng), context.parameter, coordinates);
  const staged = statements.map((s) => mapStatement(s, stage));
  const stagedImplicit = implicit.map((r) => mapStatement(r, stage) as Relation);
  const stagedAssumptions = context.assumptions.map((r) => mapStatement(r, stage) as Relation);
  const signed = signedVariables([...staged, ...stagedImplicit, ...stagedAssumptions]);

  let flat = staged.map((s) => mapStatement(s, flatten));
  let flatImplicit = stagedImplicit.map((r) => mapStatement(r, flatten) as Relation);
  const flatAssumptions = stagedAssumptions.map((r) => mapStatement(r, flatten) as Relation);

  let differentials = false;
  let dots = false;
  for (const s of [...staged, ...stagedImplicit]) walkStatement(s, (n) => {
    if (n.kind === "differential") differentials = true;
    if (n.kind === "dot") dots = true;
  });
  if (differentials && dots) {
    const links = linkDifferentials(context.parameter, moving);
    flat = flat.map((s) => mapStatement(s, (e) => bindVariables(e, links)));
    flatImplicit = flatImplicit.map((r) => mapStatement(r, (e) => bindVariables(e, links)) as Relation);
    for (const x of moving) signed.add(dotVariable(x, 1));
  }

  const fixed: { variable: string; value: Expr }[] = [];
  const conditions: Relation[] = [];
  for (const a of flatAssumptions) {
    const v = a.op === "=" && a.lhs.kind === "sym" ? a.lhs.name : null;
    if (v !== null && !freeVariables(a.rhs).has(v) && !fixed.some((f) => f.variable === v)) {
      fixed.push({ variable: v, value: a.rhs });
      // A coordinate held at a constant value along the curve does not move: θ = π/2 gives θ̇ = θ̈ = dθ = 0.
      if (moving.has(v) && freeVariables(a.rhs).size === 0) {
        for (const derived of [dotVariable(v, 1), dotVariable(v, 2), differentialVariable(v)]) fixed.push({ variable: derived, value: num(0) });
      }
    } else {
      conditions.push(a);
    }
  }
  const functions: Record<string, string> = {};
  registry.forEach((entry, name) => { functions[name] = entry.f.formula; });
  return { statements: flat, constraints: flatImplicit, fixed, conditions, signed, functions, keep: new Set([differentialVariable(context.parameter)]) };
}
