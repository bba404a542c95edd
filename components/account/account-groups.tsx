"use client";

import { GroupList } from "@/components/dashboard/group-list";
import { useGroups } from "@/components/data/queries";
import { Notice } from "@/components/ui/notice";

export function AccountGroups() {
  const groups = useGroups();
  if (groups.isPending) return <p role="status">Loading groups…</p>;
  if (groups.isError) return <Notice kind="problem">{groups.error.message}</Notice>;
  return <GroupList groups={groups.data} />;
}
