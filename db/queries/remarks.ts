import "server-only";
import { asc, eq, or } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Db } from "../client";
import { remarks, users, type Remark } from "../schema";

/** Where a thread points: a step, a span (Yjs relative positions, base64), or both; `quote` is the span's text when it was made. */
export type RemarkAnchor = { stepId?: string; span?: { from: string; to: string }; quote?: string };

export type RemarkPerson = { id: string; name: string; email: string };
export type RemarkReply = { id: string; body: string; author: RemarkPerson | null; createdAt: Date };
export type RemarkThread = {
  id: string;
  notebookId: string;
  anchor: RemarkAnchor;
  body: string;
  author: RemarkPerson | null;
  settled: boolean;
  settledBy: RemarkPerson | null;
  settledAt: Date | null;
  createdAt: Date;
  /** Time of the latest reply, settling or reopening. */
  updatedAt: Date;
  replies: RemarkReply[];
};

export type RemarkStatus = "open" | "settled" | "all";

const writer = alias(users, "writer");
const settler = alias(users, "settler");

// Left joins give the whole object as null when the account is gone.
function person(row: RemarkPerson | null): RemarkPerson | null {
  return row?.id ? { id: row.id, name: row.name, email: row.email } : null;
}

/** The remarks of a notebook as threads, oldest first, each with its replies in order. */
export async function listRemarkThreads({
  db,
  notebookId,
  status = "all",
  authorId,
  threadIds,
}: {
  db: Db;
  notebookId: string;
  status?: RemarkStatus;
  /** Only threads started by this person. */
  authorId?: string;
  threadIds?: string[];
}): Promise<RemarkThread[]> {
  const rows = await db
    .select({
      remark: remarks,
      writer: { id: writer.id, name: writer.name, email: writer.email },
      settler: { id: settler.id, name: settler.name, email: settler.email },
    })
    .from(remarks)
    .leftJoin(writer, eq(writer.id, remarks.authorId))
    .leftJoin(settler, eq(settler.id, remarks.settledBy))
    .where(eq(remarks.notebookId, notebookId))
    .orderBy(asc(remarks.createdAt), asc(remarks.id));

  const threads = new Map<string, RemarkThread>();
  for (const row of rows) {
    if (row.remark.parentId) continue;
    threads.set(row.remark.id, {
      id: row.remark.id,
      notebookId: row.remark.notebookId,
      anchor: (row.remark.anchor ?? {}) as RemarkAnchor,
      body: row.remark.body,
      author: person(row.writer),
      settled: row.remark.settled,
      settledBy: row.remark.settled ? person(row.settler) : null,
      settledAt: row.remark.settled ? row.remark.settledAt : null,
      createdAt: row.remark.createdAt,
      updatedAt: row.remark.updatedAt,
      replies: [],
    });
  }
  for (const row of rows) {
    const thread = row.remark.parentId ? threads.get(row.remark.parentId) : undefined;
    if (!thread) continue;
    thread.replies.push({ id: row.remark.id, body: row.remark.body, author: person(row.writer), createdAt: row.remark.createdAt });
  }
  return [...threads.values()].filter(
    (thread) =>
      (status === "all" || thread.settled === (status === "settled")) &&
      (!authorId || thread.author?.id === authorId) &&
      (!threadIds || threadIds.includes(thread.id)),
  );
}

export async function getRemarkThread({ db, notebookId, id }: { db: Db; notebookId: string; id: string }): Promise<RemarkThread | null> {
  const [thread] = await listRemarkThreads({ db, notebookId, threadIds: [id] });
  return thread ?? null;
}

export async function getRemarkById({ db, id }: { db: Db; id: string }): Promise<Remark | null> {
  const [row] = await db.select().from(remarks).where(eq(remarks.id, id)).limit(1);
  return row ?? null;
}

/** Starts a thread. */
export async function createRemark({
  db,
  notebookId,
  authorId,
  body,
  anchor,
}: {
  db: Db;
  notebookId: string;
  authorId: string;
  body: string;
  anchor: RemarkAnchor;
}): Promise<Remark> {
  const [row] = await db.insert(remarks).values({ notebookId, authorId, body, anchor }).returning();
  return row;
}

/** Adds a reply to a thread and marks the thread as changed. */
export async function addRemarkReply({ db, threadId, authorId, body }: { db: Db; threadId: string; authorId: string; body: string }): Promise<Remark> {
  return db.transaction(async (tx) => {
    const [thread] = await tx.update(remarks).set({ updatedAt: new Date() }).where(eq(remarks.id, threadId)).returning();
    const [reply] = await tx.insert(remarks).values({ notebookId: thread.notebookId, parentId: threadId, authorId, body }).returning();
    return reply;
  });
}

/** Settles or reopens a thread. */
export async function setRemarkSettled({ db, threadId, settled, userId }: { db: Db; threadId: string; settled: boolean; userId: string }): Promise<Remark> {
  const now = new Date();
  const [row] = await db
    .update(remarks)
    .set(settled ? { settled, settledBy: userId, settledAt: now, updatedAt: now } : { settled, settledBy: null, settledAt: null, updatedAt: now })
    .where(eq(remarks.id, threadId))
    .returning();
  return row;
}

/** Everyone who wrote in a thread (its first remark or a reply). */
export async function listRemarkThreadWriters({ db, threadId }: { db: Db; threadId: string }): Promise<RemarkPerson[]> {
  return db
    .selectDistinct({ id: users.id, name: users.name, email: users.email })
    .from(remarks)
    .innerJoin(users, eq(users.id, remarks.authorId))
    .where(or(eq(remarks.id, threadId), eq(remarks.parentId, threadId)));
}
