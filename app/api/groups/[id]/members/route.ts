// GET /api/groups/:id/members (any member)
//   → 200 {"members": [{"userId", "name", "email", "role", "joinedAt"}]}
// POST /api/groups/:id/members {"email", "role"} (lead only) — adds an existing account
//   → 201 {"member": {"userId", "name", "email", "role", "joinedAt"}}
//   → 404 not_found:user when no account uses the address (e-mail invitations come with the review work)
//   → 409 conflict:membership when they already belong to the group
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:group, 404 not_found:group
import { addMember, listMembers } from "@/db/queries/members";
import { getUserByEmail } from "@/db/queries/users";
import { announceMembershipChange } from "@/app/_server/collab/membership-events";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToGroup, auditChange } from "@/app/_server/guard";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { groupParams } from "../schema";
import { addMemberBody } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, groupParams);
  const { db, group } = await admitToGroup({ groupId: id, action: "group:read", request });
  return Response.json({ members: await listMembers({ db, groupId: group.id }) });
});

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, groupParams);
  const body = await parseJsonBody(request, addMemberBody);
  const { db, actor, group } = await admitToGroup({ groupId: id, action: "group:manage-members", request });
  const account = await getUserByEmail({ db, email: body.email });
  if (!account) {
    throw new AppError("not_found:user", "No Vierbein account uses that address yet. Ask them to sign up, then add them.");
  }
  const membership = await addMember({ db, groupId: group.id, userId: account.id, role: body.role });
  if (!membership) throw new AppError("conflict:membership", "That person is already a member; change their role instead.");
  announceMembershipChange({ groupId: group.id, userId: account.id });
  await auditChange({
    db,
    actor,
    action: "group:add-member",
    resourceType: "group",
    resourceId: group.id,
    detail: { userId: account.id, role: body.role },
    request,
  });
  return Response.json(
    { member: { userId: account.id, name: account.name, email: account.email, role: membership.role, joinedAt: membership.createdAt } },
    { status: 201 },
  );
});
