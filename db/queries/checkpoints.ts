import "server-only";
import { and, desc, eq, gt, isNull, lt, or, sql } from "drizzle-orm";
import type { Db } from "../client";
import { checkpoints, notebooks, users, type Checkpoint } from "../schema";

export type CheckpointKind = Checkpoint["kind"];

/** A checkpoint as lists show it: no document, the author's name beside their id. */
export type CheckpointListItem = {
  id: string;
  kind: CheckpointKind;
  label: string;
  createdBy: string | null;
  createdByName: string | null;
  createdAt: Date;
};

export async function saveCheckpoint({
  db,
  notebookId,
  kind,
  label = "",
  content,
  ydoc,
  createdBy,
}: {
  db: Db;
  notebookId: string;
  kind: CheckpointKind;
  label?: string;
  content: Record<string, unknown>;
  ydoc: Uint8Array | null;
  createdBy: string | null;
}): Promise<Checkpoint> {
  const [row] = await db.insert(checkpoints).values({ notebookId, kind, label, content, ydoc, createdBy }).returning();
  return row;
}

/** Every checkpoint of a notebook, newest first (the table sorts, filters and pages on the client). */
export async function listCheckpoints({ db, notebookId }: { db: Db; notebookId: string }): Promise<CheckpointListItem[]> {
  return db
    .select({
      id: checkpoints.id,
      kind: checkpoints.kind,
      label: checkpoints.label,
      createdBy: checkpoints.createdBy,
      createdByName: users.name,
      createdAt: checkpoints.createdAt,
    })
    .from(checkpoints)
    .leftJoin(users, eq(users.id, checkpoints.createdBy))
    .where(eq(checkpoints.notebookId, notebookId))
    .orderBy(desc(checkpoints.createdAt), desc(checkpoints.id));
}

/** One checkpoint of one notebook (null when the id belongs to another notebook). */
export async function getCheckpoint({ db, notebookId, id }: { db: Db; notebookId: string; id: string }): Promise<Checkpoint | null> {
  const [row] = await db
    .select()
    .from(checkpoints)
    .where(and(eq(checkpoints.id, id), eq(checkpoints.notebookId, notebookId)))
    .limit(1);
  return row ?? null;
}

export async function getLatestCheckpoint({ db, notebookId, kind }: { db: Db; notebookId: string; kind?: CheckpointKind }): Promise<Checkpoint | null> {
  const [row] = await db
    .select()
    .from(checkpoints)
    .where(kind ? and(eq(checkpoints.notebookId, notebookId), eq(checkpoints.kind, kind)) : eq(checkpoints.notebookId, notebookId))
    .orderBy(desc(checkpoints.createdAt), desc(checkpoints.id))
    .limit(1);
  return row ?? null;
}

/**
 * Notebooks due an automatic checkpoint: changed since their last checkpoint of any kind,
 * quiet since `idleSince`, and without an automatic one after `autoSince`.
 */
export async function listNotebooksDueAutoCheckpoint({ db, idleSince, autoSince }: { db: Db; idleSince: Date; autoSince: Date }): Promise<string[]> {
  const latest = db
    .select({ notebookId: checkpoints.notebookId, at: sql<Date>`max(${checkpoints.createdAt})`.as("at") })
    .from(checkpoints)
    .groupBy(checkpoints.notebookId)
    .as("latest");
  const latestAuto = db
    .select({ notebookId: checkpoints.notebookId, at: sql<Date>`max(${checkpoints.createdAt})`.as("auto_at") })
    .from(checkpoints)
    .where(eq(checkpoints.kind, "auto"))
    .groupBy(checkpoints.notebookId)
    .as("latest_auto");
  const rows = await db
    .select({ id: notebooks.id })
    .from(notebooks)
    .leftJoin(latest, eq(latest.notebookId, notebooks.id))
    .leftJoin(latestAuto, eq(latestAuto.notebookId, notebooks.id))
    .where(
      and(
        lt(notebooks.updatedAt, idleSince),
        or(isNull(latest.at), gt(notebooks.updatedAt, latest.at)),
        or(isNull(latestAuto.at), lt(latestAuto.at, autoSince)),
      ),
    )
    .limit(50);
  return rows.map((row) => row.id);
}
