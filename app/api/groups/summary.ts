import "server-only";
import type { GroupSummary } from "@/db/queries/groups";
import type { Role } from "@/db/queries/roles";
import type { Group } from "@/db/schema";

/** A group as the group routes answer with it: one field list, in one order, for the new group and for an opened one. */
export function groupSummary(group: Group, { role, memberCount }: { role: Role; memberCount: number }): GroupSummary {
  return { id: group.id, name: group.name, description: group.description, role, memberCount, createdAt: group.createdAt };
}
