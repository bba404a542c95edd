import type { Statement } from "../expr/types";
import { toPlain } from "../print/plain";
import type { DimensionReport } from "../check/protocol";
import { auditStatement, type DimensionEnvironment } from "./audit";
import { formatDimension } from "./dimension";

/** How a term is shown in a report; LaTeX for the editor, plain for scripts. */
export type TermPrinter = (s: Statement) => string;

/**
 * The wire form of a dimension audit: each top-level term with its dimension
 * ("M L^2 T^-2", "dimensionless", or null when unknown), whether they agree,
 * and the odd term.
 *
 * @example
 * dimensionReport(readLatex("E = \\mu c^2"), env).consistent // true
 */
export function dimensionReport(s: Statement, env: DimensionEnvironment, print: TermPrinter = toPlain): DimensionReport {
  const audit = auditStatement(s, env);
  return {
    consistent: audit.status === "consistent",
    status: audit.status,
    terms: audit.terms.map((t) => ({ latex: print(t.term), dimension: t.outcome.kind === "known" ? formatDimension(t.outcome.dimension) : null })),
    ...(audit.odd !== undefined ? { odd: audit.odd } : {}),
    ...(audit.unknownSymbols.length ? { unknownSymbols: audit.unknownSymbols } : {}),
    ...(audit.problems.length ? { problems: audit.problems } : {}),
  };
}
