"use client";

import Link from "next/link";
import { roleArticle, roleLabel } from "@/components/data/roles";
import type { GroupSummary } from "@/components/data/types";

export function GroupList({ groups }: { groups: GroupSummary[] }) {
  if (groups.length === 0)
    return <p className="text-sm text-ink-soft">You are not in a group yet. Start one below, or ask a group lead to add you.</p>;
  return (
    <ul className="divide-y divide-paper-edge">
      {groups.map((group) => (
        <li key={group.id} className="py-3 first:pt-0">
          <Link href={`/groups/${group.id}`} className="font-semibold">
            {group.name}
          </Link>
          <p className="text-sm text-ink-soft">
            You are {roleArticle(group.role)} <span className="font-medium">{roleLabel(group.role)}</span>
            {typeof group.memberCount === "number" && ` · ${group.memberCount} member${group.memberCount === 1 ? "" : "s"}`}
          </p>
        </li>
      ))}
    </ul>
  );
}
