// POST /api/attachments/:id/figure {"caption"?} (author or lead) — places a figure attachment at the end of its
// notebook's document, as an ordinary edit that open editors see at once
//   → 201 {"placed": "<attachment id>"}
//   → 409 conflict:attachment for CSV data (only PNG, JPEG and PDF are figures)
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:attachment
import { editNotebookDocument } from "@/app/_server/collab/documents";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToAttachment, auditChange } from "@/app/_server/guard";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { appendFigure } from "@/app/_server/storage/place-figure";
import { FIGURE_TYPES, type AttachmentType } from "@/app/_server/storage/sniff";
import { attachmentParams, placeFigureBody } from "../schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, attachmentParams);
  const body = await parseJsonBody(request, placeFigureBody);
  const { db, user, actor, attachment } = await admitToAttachment({ attachmentId: id, action: "notebook:edit", request });
  if (!FIGURE_TYPES.includes(attachment.contentType as AttachmentType)) {
    throw new AppError("conflict:attachment", "Only PNG, JPEG and PDF attachments can be figures; CSV data stays an attachment.");
  }
  const format = attachment.contentType === "application/pdf" ? "pdf" : "image";
  await editNotebookDocument({ db, notebookId: attachment.notebookId, userId: user.id, edit: appendFigure({ attachmentId: id, format, caption: body.caption ?? "" }) });
  await auditChange({ db, actor, action: "notebook:place-figure", resourceType: "notebook", resourceId: attachment.notebookId, detail: { attachmentId: id }, request });
  return Response.json({ placed: id }, { status: 201 });
});
