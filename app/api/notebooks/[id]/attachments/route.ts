// GET /api/notebooks/:id/attachments (any member)
//   → 200 {"attachments": [{"id", "fileName", "contentType", "size", "sha256", "uploadedByName", "createdAt", "url", "figure": bool}]}
// POST /api/notebooks/:id/attachments (author or lead), multipart/form-data with field "file"
//   → 201 {"attachment": {…same}}
//   → 413 payload_too_large:attachment over 10 MB; 415 unsupported_media_type:attachment when the bytes are
//     not PNG, JPEG, PDF or CSV (the name is never trusted); nothing is stored on any refusal
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:notebook
import { listAttachments } from "@/db/queries/attachments";
import type { Attachment } from "@/db/schema";
import { handleRoute } from "@/app/_server/errors";
import { admitToNotebook, auditChange } from "@/app/_server/guard";
import { parseParams } from "@/app/_server/parse";
import { FIGURE_TYPES, type AttachmentType } from "@/app/_server/storage/sniff";
import { readUploadedFile, storeAttachment } from "@/app/_server/storage/upload";
import { attachmentsParams } from "./schema";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

type Params = { id: string };

function describe(attachment: Attachment & { uploadedByName?: string | null }) {
  return {
    id: attachment.id,
    fileName: attachment.fileName,
    contentType: attachment.contentType,
    size: attachment.size,
    sha256: attachment.sha256,
    uploadedByName: attachment.uploadedByName ?? null,
    createdAt: attachment.createdAt,
    url: `/api/attachments/${attachment.id}`,
    figure: FIGURE_TYPES.includes(attachment.contentType as AttachmentType),
  };
}

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, attachmentsParams);
  const { db, notebook } = await admitToNotebook({ notebookId: id, action: "notebook:read", request });
  return Response.json({ attachments: (await listAttachments({ db, notebookId: notebook.id })).map(describe) });
});

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, attachmentsParams);
  // Who may attach is decided before a byte of the upload is read.
  const { db, user, actor, notebook } = await admitToNotebook({ notebookId: id, action: "notebook:attach", request });
  const file = await readUploadedFile(request);
  const stored = await storeAttachment({ db, notebookId: notebook.id, uploadedBy: user.id, name: file.name, bytes: file.bytes });
  await auditChange({ db, actor, action: "notebook:attach", resourceType: "notebook", resourceId: notebook.id, detail: { attachmentId: stored.id, contentType: stored.contentType, size: stored.size }, request });
  return Response.json({ attachment: describe({ ...stored, uploadedByName: user.name }) }, { status: 201 });
});
