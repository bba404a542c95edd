import type { Metadata } from "next";
import { getCurrentUser } from "@/app/_server/auth";
import { hashToken } from "@/app/_server/tokens";
import { InvitationView, type InvitationSummary } from "@/components/invitations/invitation-view";
import { getDb } from "@/db/client";
import { getInvitationByTokenHash } from "@/db/queries/invitations";
import { getUserByEmail } from "@/db/queries/users";

export const metadata: Metadata = { title: "Invitation" };
export const dynamic = "force-dynamic";

/** The link in an invitation mail: says who invites you to what, then lets you join (signing in or up on the way). */
export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const db = await getDb();
  const row = /^[A-Za-z0-9_-]{20,100}$/.test(token) ? await getInvitationByTokenHash({ db, tokenHash: hashToken(token) }) : null;
  const live = row && !row.acceptedAt && row.expiresAt > new Date();
  const user = await getCurrentUser();
  const invitation: InvitationSummary | null = live
    ? {
        groupName: row.groupName,
        role: row.role,
        email: row.email,
        invitedByName: row.invitedByName,
        expiresAt: row.expiresAt.toISOString(),
        accountExists: Boolean(await getUserByEmail({ db, email: row.email })),
      }
    : null;
  return (
    <div className="mx-auto max-w-xl px-6 py-12">
      <InvitationView token={token} invitation={invitation} signedInAs={user?.email ?? null} />
    </div>
  );
}
