import { z } from "zod";

/** The verb segment: lower-case words with dashes; whether it exists is the registry's call. */
export const verbParamsSchema = z.object({ verb: z.string().regex(/^[a-z][a-z-]{0,40}$/, "not a cas verb name") });

/**
 * HTTP status for each refusal code of a cas verb. Time-outs and content over the
 * checker's limits are 422: the request was understood and is refused as it stands
 * (resending it unchanged will not help), unlike a body over the byte cap (413).
 */
export const STATUS_BY_CODE: Readonly<Record<string, number>> = {
  malformed: 400,
  unreadable: 400,
  unknown_verb: 404,
  too_large: 422,
  timeout: 422,
  busy: 503,
  internal: 500,
};
