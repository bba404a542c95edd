import { z } from "zod";
import { checkStep } from "../check/check";
import { toLatex } from "../print/latex";
import type { CheckRequest } from "../check/protocol";

const latex = z.string().max(20_000);

export const checkContextSchema = z.object({
  symbols: z.record(z.string().max(200), z.string().max(200).nullable()).optional(),
  functions: z.record(z.string().max(200), z.array(z.string().max(200)).max(8)).optional(),
  definitions: z.array(latex).max(200).optional(),
  assumptions: z.array(latex).max(200).optional(),
  parameter: z.string().max(200).optional(),
  coordinates: z.array(z.string().max(200)).max(8).optional(),
}).strict();

const justificationSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("algebra") }).strict(),
  z.object({ kind: z.literal("substitute"), relations: z.array(latex).min(1).max(50) }).strict(),
  z.object({ kind: z.literal("differentiate"), by: z.string().min(1).max(200) }).strict(),
  z.object({ kind: z.literal("euler-lagrange"), coordinate: z.string().min(1).max(200), parameter: z.string().max(200).optional() }).strict(),
  z.object({ kind: z.literal("limit"), symbol: z.string().min(1).max(200), to: z.string().min(1).max(200) }).strict(),
  z.object({ kind: z.literal("definition") }).strict(),
]);

/** The `check` request, exactly the wire type {@link CheckRequest}. */
export const checkRequestSchema = z.object({
  context: checkContextSchema,
  from: latex,
  to: latex.min(1),
  justification: justificationSchema.optional(),
  syntax: z.enum(["latex", "plain"]).optional(),
}).strict();

/**
 * The `check` verb: one step's verdict.
 *
 * @example
 * runCheck({ context: {}, from: "(a+b)^2", to: "a^2+2ab+b^2" }) // { verdict: "verified", … }
 */
export function runCheck(input: z.infer<typeof checkRequestSchema>) {
  return checkStep(input as CheckRequest, undefined, (s) => toLatex(s));
}
