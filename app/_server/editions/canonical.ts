import "server-only";
import { createHash } from "node:crypto";

/**
 * The canonical serialisation of an edition, which its SHA-256 is taken of:
 *
 *   JSON of { format: "vierbein-edition/1", notebookId, number, title, content, ledger, reason }
 *
 * with object keys sorted by UTF-16 code unit order at every depth, no whitespace, array
 * order kept, strings and numbers as JSON.stringify writes them, `undefined` members left
 * out, and `reason` null when none was given; hashed as UTF-8 and written as lower-case hex.
 * Anyone holding the edition's JSON (GET /api/notebooks/:id/editions/:number) can recompute it.
 */
export const EDITION_FORMAT = "vierbein-edition/1";

/**
 * JSON with sorted keys and no whitespace.
 *
 * @example
 * canonicalJson({ b: 1, a: [true, null] }) // '{"a":[true,null],"b":1}'
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) return `[${value.map((item) => (item === undefined ? "null" : canonicalJson(item))).join(",")}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(",")}}`;
}

export interface EditionFacts {
  readonly notebookId: string;
  readonly number: number;
  readonly title: string;
  readonly content: unknown;
  readonly ledger: unknown;
  readonly reason: string | null;
}

export function editionSha256(facts: EditionFacts): string {
  const canonical = canonicalJson({ format: EDITION_FORMAT, ...facts, reason: facts.reason ?? null });
  return createHash("sha256").update(canonical, "utf8").digest("hex");
}
