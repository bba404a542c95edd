// GET /api/notebooks/:id/remarks?status=open|settled|all&author=<userId> (any member)
//   → 200 {"threads": [{"id", "anchor": {"stepId"?, "span"?: {"from", "to"}, "quote"?}, "body", "author": {"id", "name", "email"},
//          "settled", "settledBy", "settledAt", "createdAt", "updatedAt", "replies": [{"id", "body", "author", "createdAt"}]}],
//          "permissions": {"remark", "settle"}}
// POST /api/notebooks/:id/remarks {"body", "anchor"} (reviewer, author or lead) → 201 {"thread"}; mails the notebook's
//   authors and leads (not the writer)
//   → 400 bad_request:* (also bad_request:anchor for a step id the notebook does not have), 401, 403 forbidden:notebook,
//     404 not_found:notebook
import { createRemark, getRemarkThread, listRemarkThreads } from "@/db/queries/remarks";
import { can } from "@/app/_server/authz";
import { readNotebookDocument } from "@/app/_server/collab/documents";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToNotebook, auditChange } from "@/app/_server/guard";
import { describeAnchor, notifyRemark, stepNumberOf } from "@/app/_server/mail/remark-mail";
import { parseJsonBody, parseParams, parseSearchParams } from "@/app/_server/parse";
import { createRemarkBody, notebookRemarksParams, remarksQuery } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, notebookRemarksParams);
  const query = parseSearchParams(request, remarksQuery);
  const { db, actor, notebook, resource } = await admitToNotebook({ notebookId: id, action: "notebook:read", request });
  const threads = await listRemarkThreads({ db, notebookId: notebook.id, status: query.status, authorId: query.author });
  return Response.json({
    threads,
    permissions: { remark: can(actor, "notebook:remark", resource), settle: can(actor, "notebook:settle-remark", resource) },
  });
});

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, notebookRemarksParams);
  const body = await parseJsonBody(request, createRemarkBody);
  const { db, user, actor, notebook } = await admitToNotebook({ notebookId: id, action: "notebook:remark", request });

  const document = await readNotebookDocument({ db, notebookId: notebook.id });
  const stepNumber = body.anchor.stepId && document ? stepNumberOf(document.json, body.anchor.stepId) : null;
  if (body.anchor.stepId && stepNumber === null) throw new AppError("bad_request:anchor", "This notebook has no step with that id; it may have been deleted.");

  const remark = await createRemark({ db, notebookId: notebook.id, authorId: user.id, body: body.body, anchor: body.anchor });
  await auditChange({ db, actor, action: "notebook:remark", resourceType: "remark", resourceId: remark.id, detail: { notebookId: notebook.id }, request });
  await notifyRemark({ db, notebook, threadId: remark.id, writer: user, body: body.body, isReply: false, where: describeAnchor(body.anchor, stepNumber) });
  return Response.json({ thread: await getRemarkThread({ db, notebookId: notebook.id, id: remark.id }) }, { status: 201 });
});
