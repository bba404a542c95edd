import "server-only";
import { eq } from "drizzle-orm";
import type { Db } from "../client";
import { users, type User } from "../schema";

/** E-mail addresses are compared lower-cased and trimmed everywhere. */
export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function getUserById({ db, id }: { db: Db; id: string }): Promise<User | null> {
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  return row ?? null;
}

export async function getUserByEmail({ db, email }: { db: Db; email: string }): Promise<User | null> {
  const [row] = await db.select().from(users).where(eq(users.email, normalizeEmail(email))).limit(1);
  return row ?? null;
}

export async function createUser({
  db,
  email,
  name = "",
  passwordHash = null,
  emailVerified = null,
}: {
  db: Db;
  email: string;
  name?: string;
  passwordHash?: string | null;
  emailVerified?: Date | null;
}): Promise<User> {
  const [row] = await db
    .insert(users)
    .values({ email: normalizeEmail(email), name, passwordHash, emailVerified })
    .returning();
  return row;
}

export async function updateUser({
  db,
  id,
  changes,
}: {
  db: Db;
  id: string;
  changes: Partial<Pick<User, "name" | "email" | "passwordHash" | "emailVerified">>;
}): Promise<User | null> {
  const values = { ...changes, ...(changes.email ? { email: normalizeEmail(changes.email) } : {}) };
  const [row] = await db.update(users).set(values).where(eq(users.id, id)).returning();
  return row ?? null;
}

export async function deleteUser({ db, id }: { db: Db; id: string }): Promise<void> {
  await db.delete(users).where(eq(users.id, id));
}
