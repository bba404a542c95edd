import "server-only";
import { and, eq, like, lt } from "drizzle-orm";
import type { Db } from "../client";
import { verificationTokens, type VerificationToken } from "../schema";

export async function createVerificationToken({
  db,
  identifier,
  token,
  expires,
}: {
  db: Db;
  identifier: string;
  token: string;
  expires: Date;
}): Promise<VerificationToken> {
  const [row] = await db.insert(verificationTokens).values({ identifier, token, expires }).returning();
  return row;
}

/**
 * Deletes and returns the token in one statement, so a token works once even when two
 * requests race. Returns expired tokens too; the caller checks `expires`.
 */
export async function consumeVerificationToken({
  db,
  identifier,
  token,
}: {
  db: Db;
  identifier: string;
  token: string;
}): Promise<VerificationToken | null> {
  const [row] = await db
    .delete(verificationTokens)
    .where(and(eq(verificationTokens.identifier, identifier), eq(verificationTokens.token, token)))
    .returning();
  return row ?? null;
}

/** Drops every outstanding token for an identifier (e.g. after a password change). */
export async function deleteVerificationTokens({ db, identifier }: { db: Db; identifier: string }): Promise<void> {
  await db.delete(verificationTokens).where(eq(verificationTokens.identifier, identifier));
}

export async function deleteExpiredVerificationTokens({ db, now = new Date() }: { db: Db; now?: Date }): Promise<void> {
  await db.delete(verificationTokens).where(lt(verificationTokens.expires, now));
}

/**
 * Like consumeVerificationToken, for links that carry only the token: finds it by its
 * (unique) hash among the identifiers of one purpose, e.g. "verify-email:".
 */
export async function consumeVerificationTokenOfPurpose({
  db,
  purpose,
  token,
}: {
  db: Db;
  purpose: string;
  token: string;
}): Promise<VerificationToken | null> {
  const [row] = await db
    .delete(verificationTokens)
    .where(and(eq(verificationTokens.token, token), like(verificationTokens.identifier, `${purpose}:%`)))
    .returning();
  return row ?? null;
}
