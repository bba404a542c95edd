// Loads the invented demo group, accounts and notebooks. Safe to run any number of times:
// rows are matched by e-mail or fixed id and brought back to the demo state.
// Uses Drizzle directly (not db/queries) because it runs as a plain Node script.
import bcrypt from "bcryptjs";
import { sql } from "drizzle-orm";
import type { Db } from "../client";
import { groups, memberships, notebooks, users } from "../schema";
import { demoNotebooks } from "./notebooks";
import { DEMO_PASSWORD, demoAccounts, demoGroup } from "./people";
import type { DemoNotebook } from "./types";

export type LoadDemoOptions = {
  db: Db;
  /** Replace documents people have edited with the demo's own content (default: keep their edits). */
  resetContent?: boolean;
  notebooks?: DemoNotebook[];
};

export async function loadDemo({ db, resetContent = false, notebooks: list = demoNotebooks }: LoadDemoOptions) {
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 11);

  return db.transaction(async (tx) => {
    const userIds = new Map<string, string>();
    for (const account of demoAccounts) {
      const [row] = await tx
        .insert(users)
        .values({ email: account.email, name: account.name, passwordHash, emailVerified: new Date() })
        .onConflictDoUpdate({
          target: users.email,
          set: {
            name: account.name,
            passwordHash,
            emailVerified: sql`coalesce(${users.emailVerified}, now())`,
          },
        })
        .returning({ id: users.id });
      userIds.set(account.email, row.id);
    }

    await tx
      .insert(groups)
      .values(demoGroup)
      .onConflictDoUpdate({ target: groups.id, set: { name: demoGroup.name, description: demoGroup.description } });

    for (const account of demoAccounts) {
      await tx
        .insert(memberships)
        .values({ groupId: demoGroup.id, userId: userIds.get(account.email)!, role: account.role })
        .onConflictDoUpdate({ target: [memberships.groupId, memberships.userId], set: { role: account.role } });
    }

    for (const notebook of list) {
      const createdBy = userIds.get(notebook.createdBy) ?? null;
      await tx
        .insert(notebooks)
        .values({
          id: notebook.id,
          groupId: demoGroup.id,
          title: notebook.title,
          summary: notebook.summary,
          content: notebook.content,
          createdBy,
        })
        .onConflictDoUpdate({
          target: notebooks.id,
          set: {
            groupId: demoGroup.id,
            title: notebook.title,
            summary: notebook.summary,
            createdBy,
            // Keep what people wrote; fill in demo content only where there is none yet.
            content: resetContent ? sql`excluded.content` : sql`coalesce(${notebooks.content}, excluded.content)`,
          },
        });
    }

    return { users: demoAccounts.length, groups: 1, notebooks: list.length };
  });
}
