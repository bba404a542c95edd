// GET /api/notebooks/:id (any member of its group)
//   → 200 {"notebook": {"id", "groupId", "groupName", "title", "summary", "role", "content" (Tiptap JSON | null),
//          "createdBy", "createdAt", "updatedAt"},
//          "permissions": {"edit", "delete", "remark", "publish", "checkpoint"} (booleans for the signed-in user)}
// PATCH /api/notebooks/:id {"title"?, "summary"?} (author or lead) → 200 {"notebook": {…same without content}}
// DELETE /api/notebooks/:id (lead) → 200 {"ok": true}; 409 conflict:notebook when it has published editions
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:notebook
import type { Db } from "@/db/client";
import { getGroupById } from "@/db/queries/groups";
import { deleteNotebook, updateNotebook } from "@/db/queries/notebooks";
import type { Notebook } from "@/db/schema";
import { can, type Actor } from "@/app/_server/authz";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToNotebook, auditChange } from "@/app/_server/guard";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { notebookParams, updateNotebookBody } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

async function describe(db: Db, notebook: Notebook, actor: Actor) {
  const group = await getGroupById({ db, id: notebook.groupId });
  return {
    id: notebook.id,
    groupId: notebook.groupId,
    groupName: group?.name ?? "",
    title: notebook.title,
    summary: notebook.summary,
    role: actor?.roles[notebook.groupId] ?? null,
    createdBy: notebook.createdBy,
    createdAt: notebook.createdAt,
    updatedAt: notebook.updatedAt,
  };
}

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, notebookParams);
  const { db, actor, notebook, resource } = await admitToNotebook({ notebookId: id, action: "notebook:read", request });
  return Response.json({
    notebook: { ...(await describe(db, notebook, actor)), content: notebook.content },
    permissions: {
      edit: can(actor, "notebook:edit", resource),
      delete: can(actor, "notebook:delete", resource),
      remark: can(actor, "notebook:remark", resource),
      publish: can(actor, "notebook:publish", resource),
      checkpoint: can(actor, "notebook:checkpoint", resource),
    },
  });
});

export const PATCH = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, notebookParams);
  const body = await parseJsonBody(request, updateNotebookBody);
  const { db, actor } = await admitToNotebook({ notebookId: id, action: "notebook:edit", request });
  const updated = await updateNotebook({ db, id, changes: body });
  if (!updated) throw new AppError("not_found:notebook", "No notebook with that id.");
  await auditChange({ db, actor, action: "notebook:edit", resourceType: "notebook", resourceId: id, detail: { fields: Object.keys(body) }, request });
  return Response.json({ notebook: await describe(db, updated, actor) });
});

export const DELETE = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, notebookParams);
  const { db, actor, notebook } = await admitToNotebook({ notebookId: id, action: "notebook:delete", request });
  const outcome = await deleteNotebook({ db, id });
  if (outcome === "has_editions") {
    throw new AppError("conflict:notebook", "This notebook has published editions; their permanent links keep it.");
  }
  if (outcome === "not_found") throw new AppError("not_found:notebook", "No notebook with that id.");
  await auditChange({ db, actor, action: "notebook:delete", resourceType: "notebook", resourceId: id, detail: { title: notebook.title }, request });
  return Response.json({ ok: true });
});
