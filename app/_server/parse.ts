import "server-only";
import { z } from "zod";
import { AppError, describeZodError } from "./errors";

/** JSON bodies of our API are small; anything larger is refused before parsing. */
export const MAX_JSON_BYTES = 64 * 1024;

/**
 * Reads and validates a JSON body: 415 for another content type, 413 when too large,
 * 400 for malformed JSON or a body that does not match the schema.
 */
export async function parseJsonBody<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
  const type = request.headers.get("content-type");
  if (type && !/^application\/(.+\+)?json\b/i.test(type)) {
    throw new AppError("unsupported_media_type:body", "Send the request body as JSON (Content-Type: application/json).");
  }
  const declared = Number(request.headers.get("content-length") || 0);
  if (declared > MAX_JSON_BYTES) throw new AppError("payload_too_large:body", "The request body is too large.");
  const text = await request.text();
  if (Buffer.byteLength(text) > MAX_JSON_BYTES) throw new AppError("payload_too_large:body", "The request body is too large.");
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    throw new AppError("bad_request:json", "The request body is not valid JSON.", { cause: error });
  }
  return parseWith(schema, json, "body");
}

/** Validates query parameters (each key once; repeated keys keep the first). */
export function parseSearchParams<S extends z.ZodType>(request: Request, schema: S): z.infer<S> {
  const params = new URL(request.url).searchParams;
  const raw: Record<string, string> = {};
  for (const [key, value] of params) if (!(key in raw)) raw[key] = value;
  return parseWith(schema, raw, "query");
}

/** Validates the dynamic segments of a route (e.g. ids). */
export async function parseParams<S extends z.ZodType>(params: Promise<unknown>, schema: S): Promise<z.infer<S>> {
  return parseWith(schema, await params, "params");
}

function parseWith<S extends z.ZodType>(schema: S, value: unknown, surface: string): z.infer<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw new AppError(`bad_request:${surface}`, describeZodError(result.error), { cause: result.error });
  return result.data;
}

/** An id in a path: a UUID. */
export const idSchema = z.uuid({ message: "Not a valid id." });
