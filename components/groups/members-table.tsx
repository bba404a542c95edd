"use client";

import { createColumnHelper } from "@tanstack/react-table";
import { useId, useMemo } from "react";
import { useChangeRole, useRemoveMember } from "@/components/data/queries";
import { roleLabel, roleLabels, roles, type Role } from "@/components/data/roles";
import type { Member } from "@/components/data/types";
import { Button } from "@/components/ui/button";
import { DataTable, type DataTableLook } from "@/components/ui/data-table";
import { Notice } from "@/components/ui/notice";
import { PageButtons } from "@/components/ui/page-buttons";
import { SelectField } from "@/components/ui/select-field";
import { columnFilterText, setColumnFilterText, useClientTable } from "@/components/ui/use-client-table";

const column = createColumnHelper<Member>();
const roleOrder: Record<Role, number> = { lead: 0, author: 1, reviewer: 2, reader: 3 };
const PAGE_SIZE = 10;
const look: DataTableLook = {
  table: "text-sm",
  head: "text-ink-soft",
  headerCell: "py-2 pr-4",
  sortButton: "gap-1 hover:text-ink",
  sortGlyph: "text-xs",
  cell: (columnId) => `py-2 pr-4 ${columnId === "actions" ? "text-right" : ""}`,
  empty: "py-4 text-center",
};

/**
 * Members with their roles: filter by name or address and by role, sort by any column,
 * ten to a page (in the browser; a group has tens of members). A group lead can change a
 * role or remove someone; everyone else only reads.
 */
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
  const searchId = useId();
  const changeRole = useChangeRole(groupId);
  const removeMember = useRemoveMember(groupId);
  const failure = changeRole.error ?? removeMember.error;

  const columns = useMemo(() => {
    const whoOf = (member: Member) => member.name || member.email;
    return [
      column.accessor((member) => whoOf(member), {
        id: "name",
        header: "Name",
        // The text filter searches name and address together.
        filterFn: (row, _id, value: string) => `${row.original.name} ${row.original.email}`.toLowerCase().includes(value.toLowerCase()),
        cell: (info) => (
          <>
            {info.getValue()}
            {info.row.original.userId === currentUserId && <span className="text-ink-muted"> (you)</span>}
          </>
        ),
      }),
      column.accessor("email", { id: "email", header: "E-mail", cell: (info) => <span className="text-ink-soft">{info.getValue()}</span> }),
      column.accessor("role", {
        id: "role",
        header: "Role",
        sortingFn: (a, b) => roleOrder[a.original.role] - roleOrder[b.original.role],
        filterFn: (row, _id, value: string) => !value || row.original.role === value,
        cell: (info) => {
          const member = info.row.original;
          return manage ? (
            <SelectField
              label={`Role of ${whoOf(member)}`}
              hideLabel
              value={member.role}
              disabled={changeRole.isPending}
              onChange={(event) => changeRole.mutate({ userId: member.userId, role: event.target.value as Role })}
              options={roles.map((role) => ({ value: role, label: roleLabels[role] }))}
            />
          ) : (
            roleLabel(member.role)
          );
        },
      }),
      ...(manage
        ? [
            column.display({
              id: "actions",
              header: () => <span className="sr-only">Actions</span>,
              cell: (info) => {
                const who = whoOf(info.row.original);
                return (
                  <Button
                    tone="danger"
                    className="py-1"
                    disabled={removeMember.isPending}
                    onClick={() => {
                      if (window.confirm(`Remove ${who} from the group?`)) removeMember.mutate(info.row.original.userId);
                    }}
                  >
                    Remove<span className="sr-only"> {who}</span>
                  </Button>
                );
              },
            }),
          ]
        : []),
    ];
  }, [manage, currentUserId, changeRole, removeMember]);

  const table = useClientTable({ data: members, columns, initialSort: [{ id: "name", desc: false }], pageSize: PAGE_SIZE });
  const shown = table.getFilteredRowModel().rows.length;

  return (
    <div className="space-y-3">
      {failure && <Notice kind="problem">{failure.message}</Notice>}
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={searchId} className="text-sm font-medium">
            Filter members by name or e-mail
          </label>
          <input
            id={searchId}
            type="search"
            value={columnFilterText(table, "name")}
            onChange={(event) => setColumnFilterText(table, "name", event.target.value)}
            className="w-64 rounded-md border border-paper-edge bg-white/70 px-3 py-2"
          />
        </div>
        <SelectField
          label="Only the role"
          value={columnFilterText(table, "role")}
          onChange={(event) => setColumnFilterText(table, "role", event.target.value)}
          options={[{ value: "", label: "any role" }, ...roles.map((role) => ({ value: role, label: roleLabels[role] }))]}
        />
        <p role="status" className="text-sm text-ink-muted">
          {shown} of {members.length} member{members.length === 1 ? "" : "s"}
        </p>
      </div>
      <DataTable table={table} caption="Members of the group and their roles" look={look} empty={shown === 0 && "No member matches these filters."} />
      {table.getPageCount() > 1 && (
        <nav aria-label="Member pages" className="flex items-center justify-between text-sm">
          <PageButtons table={table} />
        </nav>
      )}
    </div>
  );
}
