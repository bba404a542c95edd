import "server-only";
import { and, asc, count, eq, gt, lte } from "drizzle-orm";
import type { Db } from "../client";
import { notebookUpdates, notebooks } from "../schema";

/** What a notebook's co-editing document is rebuilt from: the compacted snapshot plus the updates after it. */
export interface StoredNotebookDocument {
  readonly groupId: string;
  readonly snapshot: Uint8Array | null;
  /** Highest update id already merged into the snapshot. */
  readonly compactedThrough: number;
  readonly updates: readonly { id: number; data: Uint8Array }[];
  /** Tiptap JSON saved before the notebook was ever co-edited (demo data, JSON saves). */
  readonly content: Record<string, unknown> | null;
}

/** Loads a notebook's stored document state, or null when the notebook does not exist. */
export async function getStoredNotebookDocument({ db, notebookId }: { db: Db; notebookId: string }): Promise<StoredNotebookDocument | null> {
  const [row] = await db
    .select({ groupId: notebooks.groupId, ydoc: notebooks.ydoc, through: notebooks.ydocCompactedThrough, content: notebooks.content })
    .from(notebooks)
    .where(eq(notebooks.id, notebookId));
  if (!row) return null;
  const updates = await db
    .select({ id: notebookUpdates.id, data: notebookUpdates.data })
    .from(notebookUpdates)
    .where(and(eq(notebookUpdates.notebookId, notebookId), gt(notebookUpdates.id, row.through)))
    .orderBy(asc(notebookUpdates.id));
  return { groupId: row.groupId, snapshot: row.ydoc, compactedThrough: row.through, updates, content: row.content };
}

/**
 * Appends accepted Yjs updates in one statement, in order; resolves with the id of the last
 * once they are stored (before anyone is told of them).
 */
export async function appendNotebookUpdates({ db, notebookId, updates }: { db: Db; notebookId: string; updates: readonly { data: Uint8Array; userId: string | null }[] }): Promise<number> {
  const rows = await db
    .insert(notebookUpdates)
    .values(updates.map(({ data, userId }) => ({ notebookId, data, userId })))
    .returning({ id: notebookUpdates.id });
  return Math.max(...rows.map((row) => row.id));
}

/**
 * Replaces the updates up to `throughId` by one merged snapshot, in one transaction, and
 * stores the document's JSON beside it for the server-side readers (editions, export).
 */
export async function compactNotebookDocument({
  db,
  notebookId,
  snapshot,
  throughId,
  content,
}: {
  db: Db;
  notebookId: string;
  snapshot: Uint8Array;
  throughId: number;
  content: Record<string, unknown> | null;
}): Promise<void> {
  await db.transaction(async (tx) => {
    await tx
      .update(notebooks)
      .set({ ydoc: snapshot, ydocCompactedThrough: throughId, ...(content ? { content } : {}), updatedAt: new Date() })
      .where(eq(notebooks.id, notebookId));
    await tx.delete(notebookUpdates).where(and(eq(notebookUpdates.notebookId, notebookId), lte(notebookUpdates.id, throughId)));
  });
}

/** How many stored updates are waiting to be compacted. */
export async function countPendingNotebookUpdates({ db, notebookId }: { db: Db; notebookId: string }): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(notebookUpdates)
    .innerJoin(notebooks, eq(notebooks.id, notebookUpdates.notebookId))
    .where(and(eq(notebookUpdates.notebookId, notebookId), gt(notebookUpdates.id, notebooks.ydocCompactedThrough)));
  return row?.n ?? 0;
}
