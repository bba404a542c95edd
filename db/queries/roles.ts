import "server-only";
import { eq } from "drizzle-orm";
import type { Db } from "../client";
import { memberships, roleEnum } from "../schema";

/** The four roles, as the database enum spells them. */
export type Role = (typeof roleEnum.enumValues)[number];

/** Every group a user belongs to → their role there (what `can` needs to decide). */
export async function getRolesForUser({ db, userId }: { db: Db; userId: string }): Promise<Record<string, Role>> {
  const rows = await db
    .select({ groupId: memberships.groupId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.userId, userId));
  return Object.fromEntries(rows.map((row) => [row.groupId, row.role]));
}
