import "server-only";
import { desc } from "drizzle-orm";
import type { Db } from "../client";
import { mailMessages, type MailMessage } from "../schema";

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

export async function listMailMessages({ db, limit = 100 }: { db: Db; limit?: number }): Promise<MailMessage[]> {
  return db.select().from(mailMessages).orderBy(desc(mailMessages.createdAt)).limit(limit);
}
