// GET /api/groups/:id/invitations (lead only)
//   → 200 {"invitations": [{"id", "email", "role", "expiresAt", "createdAt", "invitedByName"}]} (pending ones, newest first)
// POST /api/groups/:id/invitations {"email", "role"} (lead only) — mails a single-use link, valid 7 days; a new
//   invitation to the same address replaces the earlier one
//   → 201 {"invitation": {…as above}}
//   → 409 conflict:membership when the address already belongs to a member
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:group, 404 not_found:group
import { createInvitation, listPendingInvitations } from "@/db/queries/invitations";
import { getMembership } from "@/db/queries/groups";
import { getUserByEmail, normalizeEmail } from "@/db/queries/users";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToGroup, auditChange } from "@/app/_server/guard";
import { sendInvitationMail } from "@/app/_server/mail";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { newToken } from "@/app/_server/tokens";
import { groupParams } from "../schema";
import { inviteBody } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, groupParams);
  const { db, group } = await admitToGroup({ groupId: id, action: "group:manage-members", request });
  return Response.json({ invitations: await listPendingInvitations({ db, groupId: group.id }) });
});

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, groupParams);
  const body = await parseJsonBody(request, inviteBody);
  const { db, user, actor, group } = await admitToGroup({ groupId: id, action: "group:manage-members", request });

  const email = normalizeEmail(body.email);
  const account = await getUserByEmail({ db, email });
  if (account && (await getMembership({ db, groupId: group.id, userId: account.id }))) {
    throw new AppError("conflict:membership", "That person is already a member; change their role instead.");
  }
  const token = newToken();
  const invitation = await createInvitation({
    db,
    groupId: group.id,
    email,
    role: body.role,
    tokenHash: token.hash,
    invitedBy: user.id,
    expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS),
  });
  await auditChange({ db, actor, action: "group:invite", resourceType: "group", resourceId: group.id, detail: { invitationId: invitation.id, email, role: body.role }, request });
  await sendInvitationMail({ to: email, groupName: group.name, role: body.role, inviterName: user.name || user.email, token: token.raw, expiresAt: invitation.expiresAt });
  const { id: invitationId, role, expiresAt, createdAt } = invitation;
  return Response.json({ invitation: { id: invitationId, email, role, expiresAt, createdAt, invitedByName: user.name } }, { status: 201 });
});
