import "server-only";
import { and, desc, eq, inArray, ne, sql } from "drizzle-orm";
import type { Db } from "../client";
import { mailMessages, memberships, users, type MailMessage } from "../schema";
import type { Role } from "./roles";

export async function saveMailMessage({
  db,
  message,
}: {
  db: Db;
  message: Omit<MailMessage, "id" | "createdAt" | "html"> & { html?: string | null };
}): Promise<MailMessage> {
  const [row] = await db.insert(mailMessages).values(message).returning();
  return row;
}

/** Newest first; `to` keeps messages with that recipient (case-insensitive, whole address). */
export async function listMailMessages({ db, limit = 100, to }: { db: Db; limit?: number; to?: string }): Promise<MailMessage[]> {
  const recipient = to?.trim().toLowerCase();
  return db
    .select()
    .from(mailMessages)
    .where(recipient ? sql`${recipient} = any(${mailMessages.to})` : undefined)
    .orderBy(desc(mailMessages.createdAt))
    .limit(limit);
}

/** E-mail addresses of a group's members, optionally only some roles and without one person. */
export async function listGroupMemberAddresses({
  db,
  groupId,
  roles,
  exceptUserId,
}: {
  db: Db;
  groupId: string;
  roles?: readonly Role[];
  exceptUserId?: string | null;
}): Promise<string[]> {
  const rows = await db
    .select({ email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(
      and(
        eq(memberships.groupId, groupId),
        roles ? inArray(memberships.role, [...roles]) : undefined,
        exceptUserId ? ne(users.id, exceptUserId) : undefined,
      ),
    );
  return rows.map((row) => row.email);
}
