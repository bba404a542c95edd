// GET /api/notebooks/:id/checkpoints (any member)
//   → 200 {"checkpoints": [{"id", "kind": "manual"|"auto"|"before-restore", "label", "createdBy", "createdByName", "createdAt"}]}
//     newest first; "createdByName" is null for automatic checkpoints
// POST /api/notebooks/:id/checkpoints {"label"} (author or lead) → 201 {"checkpoint": {…same}}
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:notebook
import { listCheckpoints } from "@/db/queries/checkpoints";
import { checkpointNotebook } from "@/app/_server/checkpoints/save";
import { handleRoute } from "@/app/_server/errors";
import { admitToNotebook, auditChange } from "@/app/_server/guard";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { checkpointsParams, saveCheckpointBody } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, checkpointsParams);
  const { db, notebook } = await admitToNotebook({ notebookId: id, action: "notebook:read", request });
  return Response.json({ checkpoints: await listCheckpoints({ db, notebookId: notebook.id }) });
});

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, checkpointsParams);
  const body = await parseJsonBody(request, saveCheckpointBody);
  const { db, user, actor, notebook } = await admitToNotebook({ notebookId: id, action: "notebook:checkpoint", request });
  const saved = await checkpointNotebook({ db, notebookId: notebook.id, kind: "manual", label: body.label, createdBy: user.id });
  await auditChange({ db, actor, action: "notebook:checkpoint", resourceType: "notebook", resourceId: notebook.id, detail: { checkpointId: saved.id }, request });
  return Response.json(
    { checkpoint: { id: saved.id, kind: saved.kind, label: saved.label, createdBy: saved.createdBy, createdByName: user.name, createdAt: saved.createdAt } },
    { status: 201 },
  );
});
