// POST /api/notebooks/:id/checkpoints/:cid/restore (author or lead) — no body
//   → 200 {"restored": "<cid>", "before": {"id", "kind": "before-restore", "label", "createdAt"}}
//     the current document is first saved as a before-restore checkpoint, then the checkpoint's
//     document is written as an ordinary edit (open editors see it; the update log keeps everything)
//   → 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:notebook | not_found:checkpoint
import { getCheckpoint } from "@/db/queries/checkpoints";
import { restoreCheckpoint } from "@/app/_server/checkpoints/save";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToNotebook, auditChange, authorize } from "@/app/_server/guard";
import { parseParams } from "@/app/_server/parse";
import { checkpointParams } from "../../schema";

export const dynamic = "force-dynamic";

type Params = { id: string; cid: string };

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { id, cid } = await parseParams(params, checkpointParams);
  const { db, user, actor, notebook, resource } = await admitToNotebook({ notebookId: id, action: "notebook:read", request });
  const checkpoint = await getCheckpoint({ db, notebookId: notebook.id, id: cid });
  if (!checkpoint) throw new AppError("not_found:checkpoint", "No checkpoint with that id in this notebook.");
  await authorize({ db, actor, action: "notebook:restore", resource, request });
  const { before } = await restoreCheckpoint({ db, checkpoint, userId: user.id });
  await auditChange({ db, actor, action: "notebook:restore", resourceType: "notebook", resourceId: notebook.id, detail: { checkpointId: cid, beforeId: before.id }, request });
  return Response.json({ restored: cid, before: { id: before.id, kind: before.kind, label: before.label, createdAt: before.createdAt } });
});
