// GET /api/groups → 200 {"groups": [{"id", "name", "description", "role", "memberCount", "createdAt"}]} (the user's groups)
// POST /api/groups {"name", "description"?} (any signed-in user; they become its lead)
//   → 201 {"group": {"id", "name", "description", "role": "lead", "memberCount": 1, "createdAt"}}
//   → 400 bad_request:*, 401 unauthorized:session
import { getDb } from "@/db/client";
import { createGroupWithLead, listGroupsForUser } from "@/db/queries/groups";
import { handleRoute } from "@/app/_server/errors";
import { auditChange, authorize, loadActor, requireUser } from "@/app/_server/guard";
import { parseJsonBody } from "@/app/_server/parse";
import { createGroupBody } from "./schema";
import { groupSummary } from "./summary";

export const dynamic = "force-dynamic";

export const GET = handleRoute(async () => {
  const user = await requireUser();
  return Response.json({ groups: await listGroupsForUser({ db: await getDb(), userId: user.id }) });
});

export const POST = handleRoute(async (request) => {
  const body = await parseJsonBody(request, createGroupBody);
  const user = await requireUser();
  const db = await getDb();
  const actor = await loadActor({ db, user });
  await authorize({ db, actor, action: "group:create", resource: { type: "app" }, request });
  const group = await createGroupWithLead({ db, name: body.name, description: body.description, leadUserId: user.id });
  await auditChange({ db, actor, action: "group:create", resourceType: "group", resourceId: group.id, request });
  return Response.json({ group: groupSummary(group, { role: "lead", memberCount: 1 }) }, { status: 201 });
});
