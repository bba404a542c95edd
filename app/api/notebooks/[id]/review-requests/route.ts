// GET /api/notebooks/:id/review-requests (author or lead) → 200 {"reviewers": [{"userId", "name", "email"}]}
//   the group's reviewers, whom a request can go to
// POST /api/notebooks/:id/review-requests {"reviewerId", "message"?} (author or lead) — mails the reviewer
//   → 201 {"request": {"notebookId", "reviewer": {"userId", "name", "email"}, "requestedAt"}}
//   → 400 bad_request:reviewer when that person is not a reviewer of the notebook's group
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:notebook
import { listGroupReviewers } from "@/db/queries/review-requests";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToNotebook, auditChange } from "@/app/_server/guard";
import { sendReviewRequestMail } from "@/app/_server/mail";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { reviewRequestBody, reviewRequestParams } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

async function loadForRequest(request: Request, params: Promise<Params>) {
  const { id } = await parseParams(params, reviewRequestParams);
  return admitToNotebook({ notebookId: id, action: "notebook:request-review", request });
}

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { db, notebook } = await loadForRequest(request, params);
  return Response.json({ reviewers: await listGroupReviewers({ db, groupId: notebook.groupId }) });
});

export const POST = handleRoute<Params>(async (request, { params }) => {
  const body = await parseJsonBody(request, reviewRequestBody);
  const { db, user, actor, notebook } = await loadForRequest(request, params);
  const reviewer = (await listGroupReviewers({ db, groupId: notebook.groupId })).find((r) => r.userId === body.reviewerId);
  if (!reviewer) throw new AppError("bad_request:reviewer", "That person is not a reviewer in this notebook's group.");
  await sendReviewRequestMail({ to: reviewer.email, notebookId: notebook.id, notebookTitle: notebook.title, requesterName: user.name || user.email, message: body.message });
  await auditChange({ db, actor, action: "notebook:request-review", resourceType: "notebook", resourceId: notebook.id, detail: { reviewerId: reviewer.userId }, request });
  return Response.json({ request: { notebookId: notebook.id, reviewer, requestedAt: new Date() } }, { status: 201 });
});
