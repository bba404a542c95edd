// GET /api/groups/:id (any member)
//   → 200 {"group": {"id", "name", "description", "role", "memberCount", "createdAt"},
//          "permissions": {"manageMembers", "createNotebook"}}
//   → 400 bad_request:params, 401 unauthorized:session, 403 forbidden:group, 404 not_found:group
import { listMembers } from "@/db/queries/members";
import { can } from "@/app/_server/authz";
import { handleRoute } from "@/app/_server/errors";
import { admitToGroup } from "@/app/_server/guard";
import { parseParams } from "@/app/_server/parse";
import { groupSummary } from "../summary";
import { groupParams } from "./schema";

export const dynamic = "force-dynamic";

export const GET = handleRoute<{ id: string }>(async (request, { params }) => {
  const { id } = await parseParams(params, groupParams);
  const { db, actor, group, resource } = await admitToGroup({ groupId: id, action: "group:read", request });
  const members = await listMembers({ db, groupId: group.id });
  return Response.json({
    group: groupSummary(group, { role: actor!.roles[group.id], memberCount: members.length }),
    permissions: {
      manageMembers: can(actor, "group:manage-members", resource),
      createNotebook: can(actor, "notebook:create", resource),
    },
  });
});
