import "server-only";
import { and, desc, eq } from "drizzle-orm";
import type { Db } from "../client";
import { attachments, users, type Attachment } from "../schema";

export type AttachmentListItem = Attachment & { uploadedByName: string | null };

export async function createAttachment({
  db,
  attachment,
}: {
  db: Db;
  attachment: Pick<Attachment, "notebookId" | "fileName" | "contentType" | "size" | "sha256" | "storageKey" | "uploadedBy"> & { id?: string };
}): Promise<Attachment> {
  const [row] = await db.insert(attachments).values(attachment).returning();
  return row;
}

export async function listAttachments({ db, notebookId }: { db: Db; notebookId: string }): Promise<AttachmentListItem[]> {
  const rows = await db
    .select({ attachment: attachments, uploadedByName: users.name })
    .from(attachments)
    .leftJoin(users, eq(users.id, attachments.uploadedBy))
    .where(eq(attachments.notebookId, notebookId))
    .orderBy(desc(attachments.createdAt));
  return rows.map((row) => ({ ...row.attachment, uploadedByName: row.uploadedByName }));
}

export async function getAttachmentById({ db, id }: { db: Db; id: string }): Promise<Attachment | null> {
  const [row] = await db.select().from(attachments).where(eq(attachments.id, id)).limit(1);
  return row ?? null;
}

/** The attachments of a notebook among `ids` (figures an export embeds). */
export async function getAttachmentsOfNotebook({ db, notebookId, ids }: { db: Db; notebookId: string; ids: readonly string[] }): Promise<Attachment[]> {
  if (ids.length === 0) return [];
  const rows = await listAttachments({ db, notebookId });
  return rows.filter((row) => ids.includes(row.id));
}

export async function deleteAttachment({ db, notebookId, id }: { db: Db; notebookId: string; id: string }): Promise<Attachment | null> {
  const [row] = await db
    .delete(attachments)
    .where(and(eq(attachments.id, id), eq(attachments.notebookId, notebookId)))
    .returning();
  return row ?? null;
}
