"use client";

import { useChangeRole, useRemoveMember } from "@/components/data/queries";
import { roleLabel, roleLabels, roles, type Role } from "@/components/data/roles";
import type { Member } from "@/components/data/types";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";

/** Members with their roles; a group lead can change a role or remove someone, everyone else only reads. */
export function MembersTable({
  groupId,
  members,
  manage,
  currentUserId,
}: {
  groupId: string;
  members: Member[];
  manage: boolean;
  currentUserId: string;
}) {
  const changeRole = useChangeRole(groupId);
  const removeMember = useRemoveMember(groupId);
  const failure = changeRole.error ?? removeMember.error;

  return (
    <div className="space-y-3">
      {failure && <Notice kind="problem">{failure.message}</Notice>}
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Members of the group and their roles</caption>
          <thead className="border-b border-paper-edge text-ink-soft">
            <tr>
              <th scope="col" className="py-2 pr-4 font-medium">Name</th>
              <th scope="col" className="py-2 pr-4 font-medium">E-mail</th>
              <th scope="col" className="py-2 pr-4 font-medium">Role</th>
              {manage && <th scope="col" className="py-2 font-medium"><span className="sr-only">Actions</span></th>}
            </tr>
          </thead>
          <tbody>
            {members.map((member) => {
              const who = member.name || member.email;
              const isSelf = member.userId === currentUserId;
              return (
                <tr key={member.userId} className="border-b border-paper-edge last:border-b-0">
                  <td className="py-2 pr-4">
                    {who}
                    {isSelf && <span className="text-ink-muted"> (you)</span>}
                  </td>
                  <td className="py-2 pr-4 text-ink-soft">{member.email}</td>
                  <td className="py-2 pr-4">
                    {manage ? (
                      <SelectField
                        label={`Role of ${who}`}
                        hideLabel
                        value={member.role}
                        disabled={changeRole.isPending}
                        onChange={(event) => changeRole.mutate({ userId: member.userId, role: event.target.value as Role })}
                        options={roles.map((role) => ({ value: role, label: roleLabels[role] }))}
                      />
                    ) : (
                      roleLabel(member.role)
                    )}
                  </td>
                  {manage && (
                    <td className="py-2 text-right">
                      <Button
                        tone="danger"
                        className="py-1"
                        disabled={removeMember.isPending}
                        onClick={() => {
                          if (window.confirm(`Remove ${who} from the group?`)) removeMember.mutate(member.userId);
                        }}
                      >
                        Remove<span className="sr-only"> {who}</span>
                      </Button>
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
