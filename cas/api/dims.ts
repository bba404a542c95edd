import { z } from "zod";
import { readContext } from "../check/read";
import { dimensionReport } from "../dims/report";
import { toLatex } from "../print/latex";
import type { CheckContext } from "../check/protocol";
import { checkContextSchema } from "./check";

/** The `dims` request: a context with declared dimensions and one relation or expression. */
export const dimsRequestSchema = z.object({
  context: checkContextSchema,
  relation: z.string().min(1).max(20_000),
  syntax: z.enum(["latex", "plain"]).optional(),
}).strict();

/**
 * The `dims` verb: the dimension audit of one relation.
 *
 * @example
 * runDims({ context: { symbols: { E: "energy", "\\mu": "mass" } }, relation: "E = \\mu c^2" })
 * // { consistent: true, status: "consistent", terms: [{ latex: "E", dimension: "M L^2 T^-2" }, …] }
 */
export function runDims(input: z.infer<typeof dimsRequestSchema>) {
  const rc = readContext(input.context as CheckContext, input.syntax);
  const statement = rc.read(input.relation, "relation");
  return dimensionReport(statement, rc.dimensions, (s) => toLatex(s));
}
