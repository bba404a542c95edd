import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import type { Db } from "../client";
import { groups, memberships, users, type Membership } from "../schema";
import type { Role } from "./roles";

export type Member = { userId: string; email: string; name: string; role: Role; joinedAt: Date };

export async function listMembers({ db, groupId }: { db: Db; groupId: string }): Promise<Member[]> {
  return db
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.groupId, groupId))
    .orderBy(asc(users.name), asc(users.email));
}

/** Adds a member; returns null when they already belong to the group (nothing changed). */
export async function addMember({
  db,
  groupId,
  userId,
  role,
}: {
  db: Db;
  groupId: string;
  userId: string;
  role: Role;
}): Promise<Membership | null> {
  const [row] = await db.insert(memberships).values({ groupId, userId, role }).onConflictDoNothing().returning();
  return row ?? null;
}

export type MemberChange = { ok: true; membership: Membership | null } | { ok: false; reason: "not_member" | "last_lead" };

/**
 * Changes a member's role (or removes them with role = null) while keeping at least one
 * lead. The group row is locked so two leads demoting each other at once cannot both win.
 */
export async function changeMember({
  db,
  groupId,
  userId,
  role,
}: {
  db: Db;
  groupId: string;
  userId: string;
  role: Role | null;
}): Promise<MemberChange> {
  return db.transaction(async (tx) => {
    await tx.select({ id: groups.id }).from(groups).where(eq(groups.id, groupId)).for("update");
    const where = and(eq(memberships.groupId, groupId), eq(memberships.userId, userId));
    const [current] = await tx.select().from(memberships).where(where).limit(1);
    if (!current) return { ok: false, reason: "not_member" } as const;
    if (current.role === "lead" && role !== "lead") {
      const [{ leads }] = await tx
        .select({ leads: sql<number>`count(*)::int` })
        .from(memberships)
        .where(and(eq(memberships.groupId, groupId), eq(memberships.role, "lead")));
      if (leads <= 1) return { ok: false, reason: "last_lead" } as const;
    }
    if (role === null) {
      await tx.delete(memberships).where(where);
      return { ok: true, membership: null } as const;
    }
    const [updated] = await tx.update(memberships).set({ role }).where(where).returning();
    return { ok: true, membership: updated } as const;
  });
}
