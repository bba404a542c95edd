// Shared set-up for route handler tests: an in-memory PGlite, mail kept in the database,
// and a seam to choose who is signed in. Import it FIRST in a test file so the
// environment is set before any server module reads it.
import "./env";
import { setCurrentUserSource, type CurrentUser } from "@/app/_server/auth";
import { closeDb, getDb } from "@/db/client";
import { createUser } from "@/db/queries/users";
import { auditLog } from "@/db/schema";
import { desc } from "drizzle-orm";

export { closeDb, getDb };

let counter = 0;

/** A verified account with a unique address. */
export async function makeUser(name: string): Promise<CurrentUser> {
  counter += 1;
  const user = await createUser({ db: await getDb(), email: `${name}-${counter}-${Date.now()}@example.test`, name, emailVerified: new Date() });
  return { id: user.id, email: user.email, name: user.name };
}

/** Route handlers will see this user as signed in (null: signed out). */
export function signInAs(user: CurrentUser | null): void {
  setCurrentUserSource(async () => user);
}

export function jsonRequest(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Request {
  const init: RequestInit = { method, headers: { "x-forwarded-for": "203.0.113.7", ...headers } };
  if (body !== undefined) {
    init.body = typeof body === "string" ? body : JSON.stringify(body);
    (init.headers as Record<string, string>)["content-type"] ??= "application/json";
  }
  return new Request(`http://localhost${path}`, init);
}

export function routeParams<P extends Record<string, string>>(params: P) {
  return { params: Promise.resolve(params) };
}

export const noParams = routeParams({} as Record<string, never>);

export async function lastAuditEntry() {
  const [entry] = await (await getDb()).select().from(auditLog).orderBy(desc(auditLog.id)).limit(1);
  return entry ?? null;
}
