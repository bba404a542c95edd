import type { Expr, Relation, Statement } from "../expr/types";
import { readLatex } from "../parse/latex";
import { readPlain } from "../parse/plain";
import { ReadError } from "../parse/errors";
import { normaliseName, type ReadOptions } from "../parse/options";
import { evaluateFloat } from "../numeric/evaluate";
import { DimensionSyntaxError, parseDimension, type Dimension } from "../dims/dimension";
import type { DimensionEnvironment } from "../dims/audit";
import type { CheckContext, CheckRequest, Justification } from "./protocol";
import type { ParsedContext } from "./prepare";
import type { ParsedJustification, ParsedStep } from "./verdict";
import { CasRequestError } from "./errors";
import { guardStatement } from "./guard";
import type { LimitTarget } from "../limit/probe";

const DEFAULT_COORDINATES = ["t", "r", "theta", "phi", "x", "y", "z"];

/** A context read once: reader options, the parsed context and the declared dimensions. */
export interface ReadContext {
  readonly read: (source: string, field: string) => Statement;
  readonly parsed: ParsedContext;
  readonly dimensions: DimensionEnvironment;
}

function name(text: string, field: string): string {
  try {
    return normaliseName(text);
  } catch (err) {
    throw new CasRequestError("unreadable", `${field}: ${err instanceof Error ? err.message : String(err)}`, 0, field);
  }
}

/**
 * Reads a check context: symbol names normalised to plain identifiers,
 * dimensions parsed, definitions and assumptions read with the declared names
 * taking priority. Errors carry the request field and character position.
 *
 * @example
 * readContext({ symbols: { "r_{s}": "length" }, assumptions: ["r > r_s"] }).parsed.assumptions // [r > r_s]
 */
export function readContext(context: CheckContext, syntax: "latex" | "plain" = "latex"): ReadContext {
  const symbols = Object.keys(context.symbols ?? {});
  const plainSymbols = symbols.map((s) => name(s, "context.symbols"));
  const parameter = name(context.parameter ?? "\\tau", "context.parameter");
  const coordinates = context.coordinates
    ? context.coordinates.map((c) => name(c, "context.coordinates"))
    : DEFAULT_COORDINATES.filter((c) => plainSymbols.includes(c));
  const functions = Object.keys(context.functions ?? {}).map((f) => name(f, "context.functions"));
  // The parameter counts as a coordinate for reading, so `d\tau` is a differential.
  const options: ReadOptions = { symbols: plainSymbols, functions, coordinates: [...coordinates, parameter], parameter };
  const read = (source: string, field: string): Statement => {
    let s: Statement;
    try {
      s = syntax === "plain" ? readPlain(source, options) : readLatex(source, options);
    } catch (err) {
      if (err instanceof ReadError) throw new CasRequestError(err.code === "too_long" || err.code === "too_deep" ? "too_large" : "unreadable", `${field}: ${err.message}`, err.position, field);
      throw err;
    }
    guardStatement(s, field);
    return s;
  };
  const relationOf = (source: string, field: string): Relation => {
    const s = read(source, field);
    if (s.kind !== "relation") throw new CasRequestError("malformed", `${field} must be a relation (a = b, a > b), not an expression`, 0, field);
    return s;
  };
  const dims = new Map<string, Dimension | null>();
  symbols.forEach((s, i) => {
    const text = context.symbols?.[s];
    try {
      dims.set(plainSymbols[i], text ? parseDimension(text) : null);
    } catch (err) {
      if (err instanceof DimensionSyntaxError) throw new CasRequestError("malformed", `context.symbols["${s}"]: ${err.message}`, undefined, `context.symbols`);
      throw err;
    }
  });
  return {
    read,
    parsed: {
      definitions: (context.definitions ?? []).map((d, i) => relationOf(d, `context.definitions[${i}]`)),
      assumptions: (context.assumptions ?? []).map((a, i) => relationOf(a, `context.assumptions[${i}]`)),
      parameter,
      coordinates,
    },
    dimensions: { symbols: dims, parameter },
  };
}

function limitTarget(text: string, rc: ReadContext): LimitTarget {
  const t = text.trim();
  if (["\\infty", "+\\infty", "∞", "infinity", "inf"].includes(t)) return { kind: "infinity" };
  const e = rc.read(t, "justification.to") as Expr;
  try {
    return { kind: "value", value: String(evaluateFloat(e, { values: {} })) };
  } catch {
    throw new CasRequestError("malformed", "justification.to must be \\infty or a number", 0, "justification.to");
  }
}

/** Reads the justification's names and relations. */
export function readJustification(j: Justification | undefined, rc: ReadContext): ParsedJustification {
  if (!j) return { kind: "algebra" };
  switch (j.kind) {
    case "algebra": case "definition": return { kind: j.kind };
    case "substitute":
      return { kind: "substitute", relations: j.relations.map((r, i) => {
        const s = rc.read(r, `justification.relations[${i}]`);
        if (s.kind !== "relation") throw new CasRequestError("malformed", `justification.relations[${i}] must be a relation`, 0, `justification.relations[${i}]`);
        return s;
      }) };
    case "differentiate": return { kind: "differentiate", by: name(j.by, "justification.by") };
    case "euler-lagrange":
      return { kind: "euler-lagrange", coordinate: name(j.coordinate, "justification.coordinate"), parameter: j.parameter ? name(j.parameter, "justification.parameter") : undefined };
    case "limit": return { kind: "limit", symbol: name(j.symbol, "justification.symbol"), to: limitTarget(j.to, rc) };
  }
}

/**
 * Reads a whole check request.
 *
 * @example
 * readCheckRequest({ context: {}, from: "(a+b)^2", to: "a^2+2ab+b^2" }).step.to // a^2 + 2ab + b^2
 */
export function readCheckRequest(req: CheckRequest): { step: ParsedStep; context: ReadContext } {
  const rc = readContext(req.context, req.syntax);
  const from = req.from.trim() === "" ? null : rc.read(req.from, "from");
  const to = rc.read(req.to, "to");
  return { step: { from, to, justification: readJustification(req.justification, rc) }, context: rc };
}
