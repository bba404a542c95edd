import "server-only";
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import type { Db } from "../client";
import { groups, invitations, memberships, users, type Invitation } from "../schema";
import type { Role } from "./roles";

export type PendingInvitation = Pick<Invitation, "id" | "email" | "role" | "expiresAt" | "createdAt"> & { invitedByName: string | null };
export type InvitationWithGroup = Invitation & { groupName: string; invitedByName: string | null };

/** Stores an invitation, replacing any earlier one to the same address for the same group (only the newest link works). */
export async function createInvitation({
  db,
  groupId,
  email,
  role,
  tokenHash,
  invitedBy,
  expiresAt,
}: {
  db: Db;
  groupId: string;
  email: string;
  role: Role;
  tokenHash: string;
  invitedBy: string;
  expiresAt: Date;
}): Promise<Invitation> {
  return db.transaction(async (tx) => {
    await tx.delete(invitations).where(and(eq(invitations.groupId, groupId), eq(invitations.email, email), isNull(invitations.acceptedAt)));
    const [row] = await tx.insert(invitations).values({ groupId, email, role, tokenHash, invitedBy, expiresAt }).returning();
    return row;
  });
}

/** Invitations not yet accepted and not expired, newest first. */
export async function listPendingInvitations({ db, groupId, now = new Date() }: { db: Db; groupId: string; now?: Date }): Promise<PendingInvitation[]> {
  return db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      createdAt: invitations.createdAt,
      invitedByName: users.name,
    })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.groupId, groupId), isNull(invitations.acceptedAt), gt(invitations.expiresAt, now)))
    .orderBy(desc(invitations.createdAt));
}

/** Withdraws a pending invitation; false when there was none with that id in the group. */
export async function deleteInvitation({ db, groupId, id }: { db: Db; groupId: string; id: string }): Promise<boolean> {
  const rows = await db
    .delete(invitations)
    .where(and(eq(invitations.id, id), eq(invitations.groupId, groupId), isNull(invitations.acceptedAt)))
    .returning({ id: invitations.id });
  return rows.length > 0;
}

export async function getInvitationByTokenHash({ db, tokenHash }: { db: Db; tokenHash: string }): Promise<InvitationWithGroup | null> {
  const [row] = await db
    .select({ invitation: invitations, groupName: groups.name, invitedByName: users.name })
    .from(invitations)
    .innerJoin(groups, eq(groups.id, invitations.groupId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, tokenHash))
    .limit(1);
  return row ? { ...row.invitation, groupName: row.groupName, invitedByName: row.invitedByName } : null;
}

/**
 * Uses an invitation: marks it accepted and makes the user a member with its role, in one
 * transaction. The accepted_at guard makes a token work once even when two requests race.
 * Someone who already belongs to the group keeps the role they have.
 */
export async function acceptInvitation({
  db,
  id,
  userId,
  now = new Date(),
}: {
  db: Db;
  id: string;
  userId: string;
  now?: Date;
}): Promise<{ ok: true; groupId: string; role: Role; alreadyMember: boolean } | { ok: false }> {
  return db.transaction(async (tx) => {
    const [used] = await tx
      .update(invitations)
      .set({ acceptedAt: now })
      .where(and(eq(invitations.id, id), isNull(invitations.acceptedAt), gt(invitations.expiresAt, now)))
      .returning();
    if (!used) return { ok: false } as const;
    const [added] = await tx.insert(memberships).values({ groupId: used.groupId, userId, role: used.role }).onConflictDoNothing().returning();
    if (added) return { ok: true, groupId: used.groupId, role: added.role, alreadyMember: false } as const;
    const [current] = await tx
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.groupId, used.groupId), eq(memberships.userId, userId)));
    return { ok: true, groupId: used.groupId, role: current.role, alreadyMember: true } as const;
  });
}
