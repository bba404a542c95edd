import "server-only";
import { and, asc, count, eq } from "drizzle-orm";
import type { Db } from "../client";
import { groups, memberships, type Group, type Membership } from "../schema";
import type { Role } from "./roles";

export type GroupSummary = Pick<Group, "id" | "name" | "description" | "createdAt"> & { role: Role; memberCount: number };

export async function getGroupById({ db, id }: { db: Db; id: string }): Promise<Group | null> {
  const [row] = await db.select().from(groups).where(eq(groups.id, id)).limit(1);
  return row ?? null;
}

/** The groups a user belongs to, with their role in each. */
export async function listGroupsForUser({ db, userId }: { db: Db; userId: string }): Promise<GroupSummary[]> {
  const memberCounts = db
    .select({ groupId: memberships.groupId, memberCount: count().as("member_count") })
    .from(memberships)
    .groupBy(memberships.groupId)
    .as("member_counts");
  const rows = await db
    .select({
      id: groups.id,
      name: groups.name,
      description: groups.description,
      createdAt: groups.createdAt,
      role: memberships.role,
      memberCount: memberCounts.memberCount,
    })
    .from(memberships)
    .innerJoin(groups, eq(groups.id, memberships.groupId))
    .innerJoin(memberCounts, eq(memberCounts.groupId, groups.id))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(groups.name));
  return rows.map((row) => ({ ...row, memberCount: Number(row.memberCount) }));
}

/** Creates a group; its creator becomes its first lead, in the same transaction. */
export async function createGroupWithLead({
  db,
  name,
  description = "",
  leadUserId,
  id,
}: {
  db: Db;
  name: string;
  description?: string;
  leadUserId: string;
  id?: string;
}): Promise<Group> {
  return db.transaction(async (tx) => {
    const [group] = await tx.insert(groups).values({ id, name, description }).returning();
    await tx.insert(memberships).values({ groupId: group.id, userId: leadUserId, role: "lead" });
    return group;
  });
}

export async function updateGroup({
  db,
  id,
  changes,
}: {
  db: Db;
  id: string;
  changes: Partial<Pick<Group, "name" | "description">>;
}): Promise<Group | null> {
  const [row] = await db.update(groups).set(changes).where(eq(groups.id, id)).returning();
  return row ?? null;
}

export async function getMembership({
  db,
  groupId,
  userId,
}: {
  db: Db;
  groupId: string;
  userId: string;
}): Promise<Membership | null> {
  const [row] = await db
    .select()
    .from(memberships)
    .where(and(eq(memberships.groupId, groupId), eq(memberships.userId, userId)))
    .limit(1);
  return row ?? null;
}
