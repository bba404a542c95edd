// GET /api/notebooks?q=&sort=title|updatedAt|createdAt|group&dir=asc|desc&page=1&pageSize=20&groupId=
//   → 200 {"items": [{"id", "groupId", "groupName", "title", "summary", "role", "createdByName", "createdAt", "updatedAt"}],
//          "total", "page", "pageSize"} — only notebooks of the user's groups.
// POST /api/notebooks {"groupId", "title", "summary"?} (author or lead of the group)
//   → 201 {"notebook": {"id", "groupId", "groupName", "title", "summary", "role", "createdAt", "updatedAt"}}
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:group, 404 not_found:group
import { getDb } from "@/db/client";
import { createNotebook, listNotebooksForUser } from "@/db/queries/notebooks";
import { handleRoute } from "@/app/_server/errors";
import { admitToGroup, auditChange, requireUser } from "@/app/_server/guard";
import { parseJsonBody, parseSearchParams } from "@/app/_server/parse";
import { createNotebookBody, listNotebooksQuery } from "./schema";

export const dynamic = "force-dynamic";

export const GET = handleRoute(async (request) => {
  const query = parseSearchParams(request, listNotebooksQuery);
  const user = await requireUser();
  const page = await listNotebooksForUser({ db: await getDb(), userId: user.id, ...query });
  return Response.json(page);
});

export const POST = handleRoute(async (request) => {
  const body = await parseJsonBody(request, createNotebookBody);
  const { db, user, actor, group } = await admitToGroup({ groupId: body.groupId, action: "notebook:create", request });
  const notebook = await createNotebook({ db, groupId: group.id, title: body.title, summary: body.summary, createdBy: user.id });
  await auditChange({ db, actor, action: "notebook:create", resourceType: "notebook", resourceId: notebook.id, request });
  return Response.json(
    {
      notebook: {
        id: notebook.id,
        groupId: group.id,
        groupName: group.name,
        title: notebook.title,
        summary: notebook.summary,
        role: actor!.roles[group.id],
        createdAt: notebook.createdAt,
        updatedAt: notebook.updatedAt,
      },
    },
    { status: 201 },
  );
});
