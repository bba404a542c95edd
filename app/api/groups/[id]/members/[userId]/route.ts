// PATCH /api/groups/:id/members/:userId {"role"} (lead only) → 200 {"member": {"userId", "name", "email", "role", "joinedAt"}}
// DELETE /api/groups/:id/members/:userId (lead only) → 200 {"ok": true}
//   → 409 conflict:last-lead when the change would leave the group without a lead
//   → 404 not_found:group | not_found:member, 400 bad_request:*, 401 unauthorized:session, 403 forbidden:group
import { changeMember, listMembers, type MemberChange } from "@/db/queries/members";
import { announceMembershipChange } from "@/app/_server/collab/membership-events";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToGroup, auditChange } from "@/app/_server/guard";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { changeRoleBody, memberParams } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string; userId: string };

function failIfRefused(change: MemberChange): void {
  if (change.ok) return;
  if (change.reason === "not_member") throw new AppError("not_found:member", "That person is not a member of this group.");
  throw new AppError("conflict:last-lead", "A group needs at least one lead. Make someone else lead first.");
}

export const PATCH = handleRoute<Params>(async (request, { params }) => {
  const { id, userId } = await parseParams(params, memberParams);
  const { role } = await parseJsonBody(request, changeRoleBody);
  const { db, actor, group } = await admitToGroup({ groupId: id, action: "group:manage-members", request });
  const change = await changeMember({ db, groupId: group.id, userId, role });
  failIfRefused(change);
  // Open co-editing sockets re-check this person's role at once.
  announceMembershipChange({ groupId: group.id, userId });
  await auditChange({ db, actor, action: "group:change-role", resourceType: "group", resourceId: group.id, detail: { userId, role }, request });
  const member = (await listMembers({ db, groupId: group.id })).find((m) => m.userId === userId);
  return Response.json({ member });
});

export const DELETE = handleRoute<Params>(async (request, { params }) => {
  const { id, userId } = await parseParams(params, memberParams);
  const { db, actor, group } = await admitToGroup({ groupId: id, action: "group:manage-members", request });
  failIfRefused(await changeMember({ db, groupId: group.id, userId, role: null }));
  announceMembershipChange({ groupId: group.id, userId });
  await auditChange({ db, actor, action: "group:remove-member", resourceType: "group", resourceId: group.id, detail: { userId }, request });
  return Response.json({ ok: true });
});
