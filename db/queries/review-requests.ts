import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { Db } from "../client";
import { memberships, users } from "../schema";

export type Reviewer = { userId: string; name: string; email: string };

/** The group's reviewers: whom an author may ask to review a notebook. */
export async function listGroupReviewers({ db, groupId }: { db: Db; groupId: string }): Promise<Reviewer[]> {
  return db
    .select({ userId: users.id, name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.groupId, groupId), eq(memberships.role, "reviewer")))
    .orderBy(asc(users.name), asc(users.email));
}
