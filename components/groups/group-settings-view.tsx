"use client";

import Link from "next/link";
import { useGroup, useMembers } from "@/components/data/queries";
import { roleLabel } from "@/components/data/roles";
import { Notice } from "@/components/ui/notice";
import { PageHeading } from "@/components/ui/page-heading";
import { Panel } from "@/components/ui/panel";
import { AddMemberForm } from "./add-member-form";
import { MembersTable } from "./members-table";
import { PendingInvitations } from "./pending-invitations";

export function GroupSettingsView({ groupId, currentUserId }: { groupId: string; currentUserId: string }) {
  const group = useGroup(groupId);
  const members = useMembers(groupId);
  const isLead = group.data?.role === "lead";

  if (group.isPending) return <p role="status" className="mx-auto max-w-4xl px-6 py-10">Loading the group…</p>;
  if (group.isError)
    return (
      <div className="mx-auto max-w-4xl px-6 py-10">
        <Notice kind="problem">{group.error.message}</Notice>
        <p className="mt-4">
          <Link href="/dashboard">Back to the dashboard</Link>
        </p>
      </div>
    );

  return (
    <div className="mx-auto max-w-4xl px-6 py-10">
      <p className="mb-2 text-sm">
        <Link href="/dashboard">← Dashboard</Link>
      </p>
      <PageHeading
        title={group.data.name}
        lead={
          <>
            {group.data.description && <span className="block">{group.data.description}</span>}
            Your role here: <strong>{roleLabel(group.data.role)}</strong>.
            {!isLead && " Only a group lead can change members and roles."}
          </>
        }
      />
      <div className="space-y-6">
        <Panel title="Members and roles" id="members-title">
          {members.isPending && <p role="status">Loading members…</p>}
          {members.isError && <Notice kind="problem">{members.error.message}</Notice>}
          {members.isSuccess && (
            <MembersTable groupId={groupId} members={members.data} manage={isLead} currentUserId={currentUserId} />
          )}
        </Panel>
        {isLead && (
          <Panel title="Add a member" id="add-member-title">
            <p className="mb-3 text-sm text-ink-soft">
              Someone with a Vierbein account joins at once; anyone else is e-mailed an invitation link that makes their account.
              Group leads manage members and publish; authors write; reviewers read and leave remarks; readers read.
            </p>
            <AddMemberForm groupId={groupId} />
          </Panel>
        )}
        {isLead && (
          <Panel title="Invitations" id="invitations-title">
            <PendingInvitations groupId={groupId} />
          </Panel>
        )}
      </div>
    </div>
  );
}
