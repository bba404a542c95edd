// GET /api/groups/:id (any member)
//   → 200 {"group": {"id", "name", "description", "role", "memberCount", "createdAt"},
//          "permissions": {"manageMembers", "createNotebook"}}
//   → 400 bad_request:params, 401 unauthorized:session, 403 forbidden:group, 404 not_found:group
import { getDb } from "@/db/client";
import { listMembers } from "@/db/queries/members";
import { can } from "@/app/_server/authz";
import { handleRoute } from "@/app/_server/errors";
import { findGroup } from "@/app/_server/group-lookup";
import { authorize, loadActor, requireUser } from "@/app/_server/guard";
import { parseParams } from "@/app/_server/parse";
import { groupParams } from "./schema";

export const dynamic = "force-dynamic";

export const GET = handleRoute<{ id: string }>(async (request, { params }) => {
  const { id } = await parseParams(params, groupParams);
  const user = await requireUser();
  const db = await getDb();
  const group = await findGroup(db, id);
  const actor = await loadActor({ db, user });
  const resource = { type: "group", groupId: group.id } as const;
  await authorize({ db, actor, action: "group:read", resource, request });
  const members = await listMembers({ db, groupId: group.id });
  return Response.json({
    group: {
      id: group.id,
      name: group.name,
      description: group.description,
      role: actor!.roles[group.id],
      memberCount: members.length,
      createdAt: group.createdAt,
    },
    permissions: {
      manageMembers: can(actor, "group:manage-members", resource),
      createNotebook: can(actor, "notebook:create", resource),
    },
  });
});
