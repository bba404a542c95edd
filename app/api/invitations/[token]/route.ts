// The link in an invitation mail. Holding the token proves the mailbox, so it may also make the account.
// GET /api/invitations/:token (no sign-in needed)
//   → 200 {"invitation": {"groupName", "role", "email", "invitedByName", "expiresAt", "accountExists"}}
//   → 404 not_found:invitation when the link is unknown, used, withdrawn or expired
// POST /api/invitations/:token
//   {} signed in as the invited address → 200 {"groupId", "role", "alreadyMember"}
//   {"name", "password"} signed out, when no account uses the address → creates it (confirmed) and joins → 201 {…same}
//   → 401 unauthorized:session (signed out and the address has an account: sign in first)
//   → 403 forbidden:invitation (signed in as someone else), 404 not_found:invitation, 400 bad_request:*
import { getDb } from "@/db/client";
import { acceptInvitation, getInvitationByTokenHash } from "@/db/queries/invitations";
import { createUser, getUserByEmail } from "@/db/queries/users";
import type { Db } from "@/db/client";
import { getCurrentUser } from "@/app/_server/auth";
import { announceMembershipChange } from "@/app/_server/collab/membership-events";
import { AppError, handleRoute } from "@/app/_server/errors";
import { auditChange } from "@/app/_server/guard";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { hashPassword } from "@/app/_server/passwords";
import { hashToken } from "@/app/_server/tokens";
import { acceptInvitationBody, invitationTokenParams } from "./schema";

export const dynamic = "force-dynamic";

type Params = { token: string };

const badLink = "This invitation link is not valid any more: it was used, withdrawn or has expired. Ask the group lead for a new one.";

async function findLiveInvitation(db: Db, token: string) {
  const invitation = await getInvitationByTokenHash({ db, tokenHash: hashToken(token) });
  if (!invitation || invitation.acceptedAt || invitation.expiresAt <= new Date()) throw new AppError("not_found:invitation", badLink);
  return invitation;
}

export const GET = handleRoute<Params>(async (_request, { params }) => {
  const { token } = await parseParams(params, invitationTokenParams);
  const db = await getDb();
  const invitation = await findLiveInvitation(db, token);
  const account = await getUserByEmail({ db, email: invitation.email });
  const { groupName, role, email, invitedByName, expiresAt } = invitation;
  return Response.json({ invitation: { groupName, role, email, invitedByName, expiresAt, accountExists: Boolean(account) } });
});

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { token } = await parseParams(params, invitationTokenParams);
  const body = await parseJsonBody(request, acceptInvitationBody);
  const db = await getDb();
  const invitation = await findLiveInvitation(db, token);
  const signedIn = await getCurrentUser();

  let userId: string;
  let created = false;
  if (signedIn) {
    if (signedIn.email !== invitation.email) {
      throw new AppError("forbidden:invitation", `This invitation is for ${invitation.email}. Sign out and open the link again to accept it with that address.`);
    }
    userId = signedIn.id;
  } else {
    const existing = await getUserByEmail({ db, email: invitation.email });
    if (existing) throw new AppError("unauthorized:session", `Sign in as ${invitation.email} to accept the invitation.`);
    if (!("name" in body)) throw new AppError("bad_request:body", "Choose your name and a password to make your account.");
    try {
      // Opening the mailed link proves the address, so the account starts confirmed.
      userId = (await createUser({ db, email: invitation.email, name: body.name, passwordHash: await hashPassword(body.password), emailVerified: new Date() })).id;
      created = true;
    } catch (error) {
      throw new AppError("conflict:user", "An account for this address was just made; sign in to accept.", { cause: error });
    }
  }

  const result = await acceptInvitation({ db, id: invitation.id, userId });
  if (!result.ok) throw new AppError("not_found:invitation", badLink);
  if (!result.alreadyMember) announceMembershipChange({ groupId: result.groupId, userId });
  await auditChange({
    db,
    actor: { id: userId, roles: {} },
    action: "group:accept-invitation",
    resourceType: "group",
    resourceId: result.groupId,
    detail: { invitationId: invitation.id, role: result.role, accountCreated: created },
    request,
  });
  return Response.json({ groupId: result.groupId, role: result.role, alreadyMember: result.alreadyMember }, { status: created ? 201 : 200 });
});
