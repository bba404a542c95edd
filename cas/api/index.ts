import { z } from "zod";
import { CasRequestError } from "../check/errors";
import type { CheckError } from "../check/protocol";
import { checkRequestSchema, runCheck } from "./check";
import { dimsRequestSchema, runDims } from "./dims";
import { curvatureRequestSchema, runCurvature } from "./curvature";
import { geodesicsRequestSchema, runGeodesics } from "./geodesics";
import { potentialRequestSchema, runPotential } from "./potential";
import { orbitsRequestSchema, runOrbits } from "./orbits";
import { limitRequestSchema, runLimit } from "./limit";

/**
 * The cas verbs, transport-neutral: each is a zod schema for its input and a
 * handler returning plain JSON. The CLI, the Node worker pool behind
 * `POST /api/cas/[verb]` and the browser worker all dispatch through
 * {@link runVerb}.
 *
 * Adding a verb is one line in {@link VERBS}: `name: verb(schema, handler)`.
 */
export interface Verb<S extends z.ZodType = z.ZodType> {
  readonly schema: S;
  readonly handle: (input: z.infer<S>) => unknown;
}

const verb = <S extends z.ZodType>(schema: S, handle: (input: z.infer<S>) => unknown): Verb => ({ schema, handle: handle as (input: unknown) => unknown });

export const VERBS: Readonly<Record<string, Verb>> = {
  check: verb(checkRequestSchema, runCheck),
  dims: verb(dimsRequestSchema, runDims),
  curvature: verb(curvatureRequestSchema, runCurvature),
  geodesics: verb(geodesicsRequestSchema, runGeodesics),
  potential: verb(potentialRequestSchema, runPotential),
  orbits: verb(orbitsRequestSchema, runOrbits),
  limit: verb(limitRequestSchema, runLimit),
};

export type VerbName = keyof typeof VERBS;

export function isVerb(name: string): boolean {
  return Object.hasOwn(VERBS, name);
}

/** The outcome of a verb: its JSON answer, or a CheckError-shaped refusal. */
export type VerbOutcome = { readonly ok: true; readonly value: unknown } | ({ readonly ok: false } & CheckError);

/** Describes the first zod issue as "path: message". */
export function describeIssues(error: z.ZodError): string {
  const issue = error.issues[0];
  const path = issue?.path.length ? issue.path.join(".") : "request";
  return `${path}: ${issue?.message ?? "invalid request"}`;
}

/**
 * Checks that a verb exists and its input has the right shape, without running
 * it: the refusal, or null when the input is fine.
 *
 * @example
 * validateVerbInput("check", { to: 3 }) // { code: "malformed", message: "context: …" }
 */
export function validateVerbInput(name: string, input: unknown): CheckError["error"] | null {
  if (!isVerb(name)) return { code: "unknown_verb", message: `no cas verb named "${name}"; known: ${Object.keys(VERBS).join(", ")}` };
  const parsed = VERBS[name].schema.safeParse(input);
  if (parsed.success) return null;
  const tooBig = parsed.error.issues.some((i) => i.code === "too_big");
  return { code: tooBig ? "too_large" : "malformed", message: describeIssues(parsed.error) };
}

/**
 * Validates and runs one verb. Never throws: a malformed request, unreadable
 * LaTeX or an internal failure comes back as `{ ok: false, error }`. Internal
 * failures are logged, and only a generic message is returned.
 *
 * @example
 * runVerb("dims", { context: { symbols: { r: "length" } }, relation: "r = r" }) // { ok: true, value: { consistent: true, … } }
 */
export function runVerb(name: string, input: unknown): VerbOutcome {
  const invalid = validateVerbInput(name, input);
  if (invalid) return { ok: false, error: invalid };
  const parsed = VERBS[name].schema.safeParse(input);
  if (!parsed.success) return { ok: false, error: { code: "malformed", message: describeIssues(parsed.error) } };
  try {
    return { ok: true, value: VERBS[name].handle(parsed.data) };
  } catch (err) {
    if (err instanceof CasRequestError) {
      return { ok: false, error: { code: err.code, message: err.message, ...(err.position !== undefined ? { position: err.position } : {}), ...(err.field ? { field: err.field } : {}) } };
    }
    if (err instanceof RangeError) return { ok: false, error: { code: "too_large", message: "the request is too large or too deeply nested to process" } };
    console.error("cas verb failed", name, err);
    return { ok: false, error: { code: "internal", message: "the checker failed on this request; it has been logged" } };
  }
}
