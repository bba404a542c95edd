"use client";

import { roleLabel } from "@/components/data/roles";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useInvitations, useWithdrawInvitation } from "./invitations";

const dateFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium" });

/** Invitations mailed but not yet accepted; the lead can withdraw one, which kills its link. */
export function PendingInvitations({ groupId }: { groupId: string }) {
  const invitations = useInvitations(groupId, true);
  const withdraw = useWithdrawInvitation(groupId);
  if (invitations.isPending) return <p role="status">Loading invitations…</p>;
  if (invitations.isError) return <Notice kind="problem">{invitations.error.message}</Notice>;
  if (invitations.data.length === 0) return <p className="text-sm text-ink-muted">No invitations are waiting.</p>;
  return (
    <div className="space-y-2">
      {withdraw.isError && <Notice kind="problem">{withdraw.error.message}</Notice>}
      <ul aria-label="Invitations waiting for an answer" className="divide-y divide-paper-edge text-sm">
        {invitations.data.map((invitation) => (
          <li key={invitation.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <span>
              <strong>{invitation.email}</strong> as {roleLabel(invitation.role)}
              <span className="block text-xs text-ink-muted">
                sent {dateFormat.format(new Date(invitation.createdAt))}
                {invitation.invitedByName ? ` by ${invitation.invitedByName}` : ""}, valid until {dateFormat.format(new Date(invitation.expiresAt))}
              </span>
            </span>
            <Button tone="danger" className="py-1" disabled={withdraw.isPending} onClick={() => withdraw.mutate(invitation.id)}>
              Withdraw<span className="sr-only"> the invitation to {invitation.email}</span>
            </Button>
          </li>
        ))}
      </ul>
    </div>
  );
}
