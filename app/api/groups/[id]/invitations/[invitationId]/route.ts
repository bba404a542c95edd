// DELETE /api/groups/:id/invitations/:invitationId (lead only) — withdraws a pending invitation; its link stops working
//   → 200 {"ok": true}; 404 not_found:invitation when there is no pending one with that id
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:group, 404 not_found:group
import { deleteInvitation } from "@/db/queries/invitations";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToGroup, auditChange } from "@/app/_server/guard";
import { parseParams } from "@/app/_server/parse";
import { invitationParams } from "../schema";

export const dynamic = "force-dynamic";

type Params = { id: string; invitationId: string };

export const DELETE = handleRoute<Params>(async (request, { params }) => {
  const { id, invitationId } = await parseParams(params, invitationParams);
  const { db, actor, group } = await admitToGroup({ groupId: id, action: "group:manage-members", request });
  if (!(await deleteInvitation({ db, groupId: group.id, id: invitationId }))) {
    throw new AppError("not_found:invitation", "No pending invitation with that id; it may have been accepted already.");
  }
  await auditChange({ db, actor, action: "group:revoke-invitation", resourceType: "group", resourceId: group.id, detail: { invitationId }, request });
  return Response.json({ ok: true });
});
