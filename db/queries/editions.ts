import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import type { Db } from "../client";
import { editions, users, type Edition } from "../schema";

export type EditionListItem = Pick<Edition, "id" | "number" | "title" | "sha256" | "reason" | "publishedBy" | "publishedAt"> & {
  publishedByName: string | null;
  /** Steps per verdict in the ledger. */
  tally: Record<string, number>;
};

/**
 * Stores a new edition under the next number of its notebook. The number is chosen and
 * the row inserted in one statement, and the unique (notebook, number) index settles a race
 * between two leads publishing at once: the loser gets a database error, never a duplicate.
 */
export async function createEdition({
  db,
  notebookId,
  title,
  content,
  ledger,
  reason,
  publishedBy,
  hashFor,
}: {
  db: Db;
  notebookId: string;
  title: string;
  content: Record<string, unknown>;
  ledger: unknown[];
  reason: string | null;
  publishedBy: string | null;
  /** The SHA-256 of the edition, which depends on its number. */
  hashFor: (number: number) => string;
}): Promise<Edition> {
  return db.transaction(async (tx) => {
    const [{ next }] = await tx
      .select({ next: sql<number>`coalesce(max(${editions.number}), 0) + 1` })
      .from(editions)
      .where(eq(editions.notebookId, notebookId));
    const number = Number(next);
    const [row] = await tx
      .insert(editions)
      .values({ notebookId, number, title, content, ledger, reason, publishedBy, sha256: hashFor(number) })
      .returning();
    return row;
  });
}

function tallyOf(ledger: unknown[]): Record<string, number> {
  const tally: Record<string, number> = {};
  for (const entry of ledger) {
    const verdict = (entry as { verdict?: unknown })?.verdict;
    if (typeof verdict === "string") tally[verdict] = (tally[verdict] ?? 0) + 1;
  }
  return tally;
}

/** A notebook's editions, oldest first, without their content. */
export async function listEditions({ db, notebookId }: { db: Db; notebookId: string }): Promise<EditionListItem[]> {
  const rows = await db
    .select({
      id: editions.id,
      number: editions.number,
      title: editions.title,
      sha256: editions.sha256,
      reason: editions.reason,
      publishedBy: editions.publishedBy,
      publishedByName: users.name,
      publishedAt: editions.publishedAt,
      ledger: editions.ledger,
    })
    .from(editions)
    .leftJoin(users, eq(users.id, editions.publishedBy))
    .where(eq(editions.notebookId, notebookId))
    .orderBy(asc(editions.number));
  return rows.map(({ ledger, ...row }) => ({ ...row, tally: tallyOf(ledger) }));
}

export async function getEditionByNumber({
  db,
  notebookId,
  number,
}: {
  db: Db;
  notebookId: string;
  number: number;
}): Promise<(Edition & { publishedByName: string | null }) | null> {
  const [row] = await db
    .select({ edition: editions, publishedByName: users.name })
    .from(editions)
    .leftJoin(users, eq(users.id, editions.publishedBy))
    .where(and(eq(editions.notebookId, notebookId), eq(editions.number, number)))
    .limit(1);
  return row ? { ...row.edition, publishedByName: row.publishedByName } : null;
}

/** Whether any edition of the notebook shows this attachment (then its file is as public as the edition). */
export async function isAttachmentInEdition({ db, notebookId, attachmentId }: { db: Db; notebookId: string; attachmentId: string }): Promise<boolean> {
  const [row] = await db
    .select({ id: editions.id })
    .from(editions)
    .where(and(eq(editions.notebookId, notebookId), sql`strpos(${editions.content}::text, ${attachmentId}) > 0`))
    .limit(1);
  return row !== undefined;
}
