import "server-only";
import { and, asc, count, desc, eq, ilike, or, sql, type SQL } from "drizzle-orm";
import type { Db } from "../client";
import { editions, groups, memberships, notebooks, users, type Notebook } from "../schema";
import type { Role } from "./roles";

export const notebookSortKeys = ["title", "updatedAt", "createdAt", "group"] as const;
export type NotebookSortKey = (typeof notebookSortKeys)[number];

export type NotebookListItem = {
  id: string;
  groupId: string;
  groupName: string;
  title: string;
  summary: string;
  role: Role;
  createdByName: string | null;
  createdAt: Date;
  updatedAt: Date;
};

export type NotebookPage = { items: NotebookListItem[]; total: number; page: number; pageSize: number };

/** LIKE treats % and _ as wildcards; a search for "r_s" must match those characters literally. */
function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/**
 * The notebooks of every group the user belongs to, filtered by `q` (title, summary or
 * group name), sorted and paginated for the dashboard table.
 */
export async function listNotebooksForUser({
  db,
  userId,
  q,
  sort = "updatedAt",
  dir = sort === "title" || sort === "group" ? "asc" : "desc",
  page = 1,
  pageSize = 20,
  groupId,
}: {
  db: Db;
  userId: string;
  q?: string;
  sort?: NotebookSortKey;
  dir?: "asc" | "desc";
  page?: number;
  pageSize?: number;
  groupId?: string;
}): Promise<NotebookPage> {
  const conditions: SQL[] = [eq(memberships.userId, userId)];
  if (groupId) conditions.push(eq(notebooks.groupId, groupId));
  if (q && q.trim()) {
    const pattern = `%${escapeLike(q.trim())}%`;
    conditions.push(or(ilike(notebooks.title, pattern), ilike(notebooks.summary, pattern), ilike(groups.name, pattern))!);
  }
  const where = and(...conditions);
  const sortColumn = {
    title: sql`lower(${notebooks.title})`,
    updatedAt: notebooks.updatedAt,
    createdAt: notebooks.createdAt,
    group: sql`lower(${groups.name})`,
  }[sort];
  const order = dir === "asc" ? asc : desc;

  const [{ total }] = await db
    .select({ total: count() })
    .from(notebooks)
    .innerJoin(memberships, eq(memberships.groupId, notebooks.groupId))
    .innerJoin(groups, eq(groups.id, notebooks.groupId))
    .where(where);

  const items = await db
    .select({
      id: notebooks.id,
      groupId: notebooks.groupId,
      groupName: groups.name,
      title: notebooks.title,
      summary: notebooks.summary,
      role: memberships.role,
      createdByName: users.name,
      createdAt: notebooks.createdAt,
      updatedAt: notebooks.updatedAt,
    })
    .from(notebooks)
    .innerJoin(memberships, eq(memberships.groupId, notebooks.groupId))
    .innerJoin(groups, eq(groups.id, notebooks.groupId))
    .leftJoin(users, eq(users.id, notebooks.createdBy))
    // The id breaks ties so pages never repeat or skip a row.
    .where(where)
    .orderBy(order(sortColumn), asc(notebooks.id))
    .limit(pageSize)
    .offset((page - 1) * pageSize);

  return { items, total: Number(total), page, pageSize };
}

export async function getNotebookById({ db, id }: { db: Db; id: string }): Promise<Notebook | null> {
  const [row] = await db.select().from(notebooks).where(eq(notebooks.id, id)).limit(1);
  return row ?? null;
}

export async function createNotebook({
  db,
  groupId,
  title,
  summary = "",
  content = null,
  createdBy,
  id,
}: {
  db: Db;
  groupId: string;
  title: string;
  summary?: string;
  content?: Record<string, unknown> | null;
  createdBy: string | null;
  id?: string;
}): Promise<Notebook> {
  const [row] = await db.insert(notebooks).values({ id, groupId, title, summary, content, createdBy }).returning();
  return row;
}

export async function updateNotebook({
  db,
  id,
  changes,
}: {
  db: Db;
  id: string;
  changes: Partial<Pick<Notebook, "title" | "summary" | "content">>;
}): Promise<Notebook | null> {
  const [row] = await db
    .update(notebooks)
    .set({ ...changes, updatedAt: new Date() })
    .where(eq(notebooks.id, id))
    .returning();
  return row ?? null;
}

export async function countEditions({ db, notebookId }: { db: Db; notebookId: string }): Promise<number> {
  const [{ n }] = await db.select({ n: count() }).from(editions).where(eq(editions.notebookId, notebookId));
  return Number(n);
}

/**
 * Deletes a notebook and everything hanging off it. Refuses (returns "has_editions") when it
 * has published editions: their permanent links must keep working.
 */
export async function deleteNotebook({
  db,
  id,
}: {
  db: Db;
  id: string;
}): Promise<"deleted" | "not_found" | "has_editions"> {
  return db.transaction(async (tx) => {
    if ((await countEditions({ db: tx, notebookId: id })) > 0) return "has_editions";
    const deleted = await tx.delete(notebooks).where(eq(notebooks.id, id)).returning({ id: notebooks.id });
    return deleted.length ? "deleted" : "not_found";
  });
}
