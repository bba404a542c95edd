import "server-only";
import type { Db } from "@/db/client";
import { saveCheckpoint, type CheckpointKind } from "@/db/queries/checkpoints";
import type { Checkpoint } from "@/db/schema";
import { editNotebookDocument, readNotebookDocument, replaceWithJson } from "../collab/documents";
import { AppError } from "../errors";

/** Saves the notebook's current document (read from the live document, never from the derived JSON column). */
export async function checkpointNotebook({
  db,
  notebookId,
  kind,
  label = "",
  createdBy,
}: {
  db: Db;
  notebookId: string;
  kind: CheckpointKind;
  label?: string;
  createdBy: string | null;
}): Promise<Checkpoint> {
  const document = await readNotebookDocument({ db, notebookId });
  if (!document) throw new AppError("not_found:notebook", "No notebook with that id.");
  return saveCheckpoint({ db, notebookId, kind, label, content: document.json, ydoc: document.state, createdBy });
}

/**
 * Makes a checkpoint the current state without losing anything: first a "before-restore"
 * checkpoint of what is there now, then the checkpoint's document written as an ordinary
 * edit, so open editors see it and the update log keeps every earlier change.
 */
export async function restoreCheckpoint({
  db,
  checkpoint,
  userId,
}: {
  db: Db;
  checkpoint: Checkpoint;
  userId: string;
}): Promise<{ before: Checkpoint }> {
  if (!checkpoint.content) throw new AppError("conflict:checkpoint", "This checkpoint has no document to restore.");
  const label = `Before restoring “${checkpoint.label || checkpoint.createdAt.toISOString().slice(0, 16).replace("T", " ")}”`;
  const before = await checkpointNotebook({ db, notebookId: checkpoint.notebookId, kind: "before-restore", label, createdBy: userId });
  await editNotebookDocument({ db, notebookId: checkpoint.notebookId, userId, edit: replaceWithJson(checkpoint.content) });
  return { before };
}
