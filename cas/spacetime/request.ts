import { z } from "zod";
import type { Expr, Statement } from "../expr/types";
import { readLatex, readLatexExpr } from "../parse/latex";
import { readPlain, readPlainExpr } from "../parse/plain";
import { normaliseName, type ReadOptions } from "../parse/options";
import { ReadError } from "../parse/errors";
import { toLatex } from "../print/latex";
import { toPlain } from "../print/plain";
import { CasRequestError } from "../check/errors";
import { metricFromComponents, metricFromLineElement, MetricError, type Metric } from "./metric";
import { DegenerateMetricError } from "./inverse";

/**
 * The request fields the four spacetime verbs share, and how they are read:
 * coordinates (LaTeX names), the metric as a line element or a components
 * matrix, declared symbols and undetermined functions, and definitions
 * substituted before the analysis (`{"r_s": "\\frac{2GM}{c^2}"}`).
 */
const text = z.string().min(1).max(20_000);
export const spacetimeFields = {
  coordinates: z.array(z.string().min(1).max(200)).min(2).max(4),
  metric: text.optional(),
  components: z.array(z.array(z.string().min(1).max(5_000)).min(2).max(4)).min(2).max(4).optional(),
  symbols: z.array(z.string().min(1).max(200)).max(100).optional(),
  functions: z.array(z.string().min(1).max(200)).max(20).optional(),
  definitions: z.record(z.string().min(1).max(200), text).optional(),
  parameter: z.string().min(1).max(200).optional(),
  syntax: z.enum(["latex", "plain"]).optional(),
};

export const oneMetric = (v: { metric?: string; components?: string[][] }) => (v.metric === undefined) !== (v.components === undefined);
export const ONE_METRIC_MESSAGE = "give the metric either as \"metric\" (a line element) or as \"components\" (a matrix), not both";

export interface SpacetimeInput {
  readonly coordinates: string[];
  readonly metric?: string;
  readonly components?: string[][];
  readonly symbols?: string[];
  readonly functions?: string[];
  readonly definitions?: Record<string, string>;
  readonly parameter?: string;
  readonly syntax?: "latex" | "plain";
}

export interface ReadSpacetime {
  readonly metric: Metric;
  readonly definitions: Record<string, Expr>;
  readonly parameter: string;
  readonly options: ReadOptions;
}

/** Runs `read` and turns a reader or metric error into a request error naming the field. */
export function asRequestError<T>(field: string, read: () => T): T {
  try {
    return read();
  } catch (error) {
    if (error instanceof ReadError) throw new CasRequestError("unreadable", `${field}: ${error.message}`, (error as ReadError & { position?: number }).position, field);
    if (error instanceof MetricError || error instanceof DegenerateMetricError) throw new CasRequestError("malformed", `${field}: ${error.message}`, undefined, field);
    throw error;
  }
}

/**
 * Reads the shared fields into a metric (the raw component trees) and the definitions.
 *
 * @example
 * readSpacetime({ coordinates: ["t", "r", "\\theta", "\\phi"], metric: "ds^2 = -c^2 dt^2 + dr^2 + r^2 d\\theta^2 + r^2\\sin^2\\theta d\\phi^2" })
 */
export function readSpacetime(input: SpacetimeInput): ReadSpacetime {
  const coordinates = asRequestError("coordinates", () => input.coordinates.map(normaliseName));
  const options: ReadOptions = { coordinates, symbols: input.symbols ?? [], functions: input.functions ?? [], parameter: input.parameter };
  const plain = input.syntax === "plain";
  const readExpr = (s: string) => (plain ? readPlainExpr(s, options) : readLatexExpr(s, options));
  const metric = input.metric !== undefined
    ? asRequestError("metric", () => {
      const statement: Statement = plain ? readPlain(input.metric!, { ...options, lineElement: true }) : readLatex(input.metric!, { ...options, lineElement: true });
      return metricFromLineElement(statement.kind === "relation" ? statement.rhs : statement, coordinates);
    })
    : asRequestError("components", () => metricFromComponents(input.components!.map((row) => row.map(readExpr)), coordinates));
  const definitions: Record<string, Expr> = {};
  for (const [name, value] of Object.entries(input.definitions ?? {})) {
    definitions[asRequestError("definitions", () => normaliseName(name))] = asRequestError(`definitions.${name}`, () => readExpr(value));
  }
  const parameter = input.parameter ? asRequestError("parameter", () => normaliseName(input.parameter!)) : "tau";
  return { metric, definitions, parameter, options };
}

/** A symbolic result on the wire: LaTeX for KaTeX, plain syntax for scripts. */
export function symbolic(s: Statement): { latex: string; expr: string } {
  return { latex: toLatex(s), expr: toPlain(s) };
}

/** Reads `values` keys (LaTeX or plain names) into plain identifiers. */
export function readValues(values: Record<string, number>): Record<string, number> {
  return Object.fromEntries(Object.entries(values).map(([k, v]) => [asRequestError("values", () => normaliseName(k)), v]));
}
