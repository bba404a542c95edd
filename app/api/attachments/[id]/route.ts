// GET /api/attachments/:id — the file, for members of the notebook's group, and for anyone when an
// edition of the notebook shows it (editions are public)
//   → 200 the bytes with the sniffed Content-Type, Content-Disposition: attachment; filename…,
//     X-Content-Type-Options: nosniff and a sandboxing Content-Security-Policy
//   → 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:attachment
// DELETE /api/attachments/:id (author or lead) — removes the attachment and its bytes
//   → 204
//   → 409 conflict:attachment while a figure in the notebook shows it (remove the figure first), or for
//     good once a published edition shows it (editions are frozen and public)
//   → 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:attachment
import { getDb } from "@/db/client";
import { deleteAttachment, getAttachmentById } from "@/db/queries/attachments";
import { isAttachmentInEdition } from "@/db/queries/editions";
import { placesAttachment } from "@/editor/figure";
import { getCurrentUser } from "@/app/_server/auth";
import { readNotebookDocument } from "@/app/_server/collab/documents";
import { findNotebook } from "@/app/_server/editions/notebook-lookup";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToAttachment, auditChange, authorize, loadActor } from "@/app/_server/guard";
import { parseParams } from "@/app/_server/parse";
import { deleteObject, getObject } from "@/app/_server/storage/object-store";
import { attachmentParams } from "./schema";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

type Params = { id: string };

/** `attachment` with an ASCII fallback name and the exact UTF-8 name (RFC 6266). */
function contentDisposition(fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, attachmentParams);
  const db = await getDb();
  const attachment = await getAttachmentById({ db, id });
  if (!attachment) throw new AppError("not_found:attachment", "No attachment with that id.");
  const { resource } = await findNotebook(db, attachment.notebookId);
  if (!(await isAttachmentInEdition({ db, notebookId: attachment.notebookId, attachmentId: id }))) {
    const user = await getCurrentUser();
    if (!user) throw new AppError("unauthorized:session", "Sign in to continue.");
    await authorize({ db, actor: await loadActor({ db, user }), action: "notebook:read", resource, request });
  }
  const bytes = await getObject({ key: attachment.storageKey });
  if (!bytes) throw new AppError("not_found:attachment", "The file of this attachment is missing from storage.");
  return new Response(Buffer.from(bytes), {
    headers: {
      "Content-Type": attachment.contentType,
      "Content-Length": String(bytes.byteLength),
      "Content-Disposition": contentDisposition(attachment.fileName),
      "X-Content-Type-Options": "nosniff",
      "Content-Security-Policy": "default-src 'none'; sandbox",
      "Cache-Control": "private, max-age=3600",
    },
  });
});

export const DELETE = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, attachmentParams);
  const { db, actor, attachment } = await admitToAttachment({ attachmentId: id, action: "notebook:attach", request });
  if (await isAttachmentInEdition({ db, notebookId: attachment.notebookId, attachmentId: id })) {
    throw new AppError("conflict:attachment", "A published edition shows this attachment; editions are frozen, so it stays.");
  }
  const document = await readNotebookDocument({ db, notebookId: attachment.notebookId });
  if (document && placesAttachment(document.json, id)) {
    throw new AppError("conflict:attachment", "A figure in the notebook shows this attachment; remove the figure first.");
  }
  // The row goes first: a row without its bytes would be a broken link, bytes without a row are only unused space.
  await deleteAttachment({ db, notebookId: attachment.notebookId, id });
  await deleteObject({ key: attachment.storageKey }).catch((error: unknown) => {
    console.warn(`[attachments] the bytes of ${id} stay in storage: ${error instanceof Error ? error.message : String(error)}`);
  });
  await auditChange({ db, actor, action: "notebook:remove-attachment", resourceType: "notebook", resourceId: attachment.notebookId, detail: { attachmentId: id, fileName: attachment.fileName }, request });
  return new Response(null, { status: 204 });
});
