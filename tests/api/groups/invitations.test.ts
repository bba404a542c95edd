// Invitations: the lead invites by e-mail with a role; the mailed link (received by the local
// SMTP server) makes the account if needed and adds the person, once.
import { closeDb, getDb, jsonRequest, lastAuditEntry, makeUser, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CurrentUser } from "@/app/_server/auth";
import { authorizeWithPassword } from "@/app/_server/auth";
import { stopLocalSmtpServer } from "@/app/_server/mail";
import { GET as listInvitations, POST as invite } from "@/app/api/groups/[id]/invitations/route";
import { DELETE as revoke } from "@/app/api/groups/[id]/invitations/[invitationId]/route";
import { GET as showInvitation, POST as acceptRoute } from "@/app/api/invitations/[token]/route";
import { createGroupWithLead, getMembership } from "@/db/queries/groups";
import { listMailMessages } from "@/db/queries/mail";
import { addMember } from "@/db/queries/members";
import { getUserByEmail } from "@/db/queries/users";
import { invitations } from "@/db/schema";
import { eq } from "drizzle-orm";

let lead: CurrentUser, author: CurrentUser, existing: CurrentUser, stranger: CurrentUser;
let groupId: string;

beforeAll(async () => {
  const db = await getDb();
  [lead, author, existing, stranger] = await Promise.all(["lead", "author", "existing", "stranger"].map(makeUser));
  groupId = (await createGroupWithLead({ db, name: "Tidal group", leadUserId: lead.id })).id;
  await addMember({ db, groupId, userId: author.id, role: "author" });
}, 120_000);
afterAll(async () => {
  await stopLocalSmtpServer();
  await closeDb();
});

const post = (body: unknown) => invite(jsonRequest("POST", `/api/groups/${groupId}/invitations`, body), routeParams({ id: groupId }));
const accept = (token: string, body: unknown = {}) => acceptRoute(jsonRequest("POST", `/api/invitations/${token}`, body), routeParams({ token }));
const show = (token: string) => showInvitation(jsonRequest("GET", `/api/invitations/${token}`), routeParams({ token }));

/** The token in the newest invitation mail to the address, as the local SMTP server received it. */
async function mailedToken(address: string): Promise<string> {
  const [mail] = (await listMailMessages({ db: await getDb(), to: address })).filter((m) => m.kind === "invitation");
  expect(mail, `an invitation mail to ${address}`).toBeDefined();
  const match = mail.text.match(/\/invitations\/([A-Za-z0-9_-]+)/);
  if (!match) throw new Error(`no link in ${mail.text}`);
  return match[1];
}

describe("inviting", () => {
  it("mails a newcomer a single-use link; it makes a confirmed account and adds them with the role", async () => {
    signInAs(lead);
    const response = await post({ email: "New.Referee@Example.test", role: "reviewer" });
    expect(response.status).toBe(201);
    expect((await response.json()).invitation).toMatchObject({ email: "new.referee@example.test", role: "reviewer" });

    const [mail] = await listMailMessages({ db: await getDb(), to: "new.referee@example.test" });
    expect(mail).toMatchObject({ kind: "invitation", to: ["new.referee@example.test"] });
    expect(mail.subject).toContain("Tidal group");
    const token = await mailedToken("new.referee@example.test");
    // Only the hash is stored.
    const [row] = await (await getDb()).select().from(invitations).where(eq(invitations.email, "new.referee@example.test"));
    expect(row.tokenHash).not.toContain(token);

    signInAs(null);
    expect((await (await show(token)).json()).invitation).toMatchObject({ groupName: "Tidal group", role: "reviewer", accountExists: false });
    const bad = await accept(token, { name: "New Referee", password: "short" });
    expect(bad.status).toBe(400);
    const joined = await accept(token, { name: "New Referee", password: "long-enough-1" });
    expect(joined.status).toBe(201);
    expect(await joined.json()).toMatchObject({ groupId, role: "reviewer", alreadyMember: false });

    const account = await getUserByEmail({ db: await getDb(), email: "new.referee@example.test" });
    expect(account?.emailVerified).not.toBeNull();
    expect(await getMembership({ db: await getDb(), groupId, userId: account!.id })).toMatchObject({ role: "reviewer" });
    expect(await authorizeWithPassword({ email: "new.referee@example.test", password: "long-enough-1" }, { "x-forwarded-for": "198.51.100.1" })).not.toBeNull();

    // Single use.
    expect((await show(token)).status).toBe(404);
    expect((await accept(token, { name: "Again", password: "long-enough-2" })).status).toBe(404);
  });

  it("asks someone with an account to sign in as the invited address, and refuses anyone else", async () => {
    signInAs(lead);
    await post({ email: existing.email, role: "author" });
    const token = await mailedToken(existing.email);

    signInAs(null);
    expect((await (await show(token)).json()).invitation.accountExists).toBe(true);
    const signedOut = await accept(token);
    expect(signedOut.status).toBe(401);
    expect((await signedOut.json()).error.message).toContain(`Sign in as ${existing.email}`);

    signInAs(stranger);
    const wrongPerson = await accept(token);
    expect(wrongPerson.status).toBe(403);
    expect(await getMembership({ db: await getDb(), groupId, userId: stranger.id })).toBeNull();

    signInAs(existing);
    expect(await (await accept(token)).json()).toMatchObject({ groupId, role: "author", alreadyMember: false });
    expect(await lastAuditEntry()).toMatchObject({ actorId: existing.id, action: "group:accept-invitation", outcome: "allowed" });
  });

  it("replaces an earlier invitation to the same address, lists pending ones and withdraws them", async () => {
    signInAs(lead);
    await post({ email: "twice@example.test", role: "reader" });
    const first = await mailedToken("twice@example.test");
    const second = (await (await post({ email: "twice@example.test", role: "reviewer" })).json()).invitation;
    expect((await show(first)).status).toBe(404);

    const listed = (await (await listInvitations(jsonRequest("GET", `/api/groups/${groupId}/invitations`), routeParams({ id: groupId }))).json()).invitations;
    expect(listed.filter((i: { email: string }) => i.email === "twice@example.test")).toEqual([expect.objectContaining({ id: second.id, role: "reviewer" })]);

    const token = await mailedToken("twice@example.test");
    const params = routeParams({ id: groupId, invitationId: second.id });
    expect((await revoke(jsonRequest("DELETE", `/api/groups/${groupId}/invitations/${second.id}`), params)).status).toBe(200);
    expect((await show(token)).status).toBe(404);
    expect((await revoke(jsonRequest("DELETE", `/api/groups/${groupId}/invitations/${second.id}`), params)).status).toBe(404);
  });

  it("refuses an expired link", async () => {
    signInAs(lead);
    await post({ email: "late@example.test", role: "reader" });
    const token = await mailedToken("late@example.test");
    await (await getDb()).update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.email, "late@example.test"));
    signInAs(null);
    const response = await accept(token, { name: "Late", password: "long-enough-3" });
    expect(response.status).toBe(404);
    expect((await response.json()).error.message).toMatch(/expired/);
  });

  it("is for the lead only, and not for people who are already members", async () => {
    signInAs(author);
    expect((await post({ email: "x@example.test", role: "reader" })).status).toBe(403);
    expect((await listInvitations(jsonRequest("GET", `/api/groups/${groupId}/invitations`), routeParams({ id: groupId }))).status).toBe(403);
    signInAs(lead);
    const member = await post({ email: author.email, role: "reader" });
    expect(member.status).toBe(409);
    expect((await post({ email: "not-an-address", role: "reader" })).status).toBe(400);
    expect((await post({ email: "y@example.test", role: "owner" })).status).toBe(400);
  });
});
