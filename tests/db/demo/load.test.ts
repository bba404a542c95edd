import bcrypt from "bcryptjs";
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DbHandle } from "@/db/client";
import { loadDemo } from "@/db/demo/load";
import { demoNotebooks } from "@/db/demo/notebooks";
import { DEMO_PASSWORD, demoAccounts, demoGroup } from "@/db/demo/people";
import { memberships, notebooks, users } from "@/db/schema";
import { variants } from "../harness";

for (const variant of variants) {
  describe.skipIf(!variant.enabled)(`demo loader on ${variant.name}`, () => {
    let handle: DbHandle;
    beforeAll(async () => {
      handle = await variant.open();
    });
    afterAll(async () => {
      await handle?.close();
    });

    async function count(table: typeof users | typeof memberships | typeof notebooks) {
      const [{ n }] = await handle.db.select({ n: sql<number>`count(*)::int` }).from(table);
      return n;
    }

    it("loads five verified accounts with the demo password and their roles", async () => {
      await loadDemo({ db: handle.db });
      const rows = await handle.db.select().from(users);
      expect(rows.map((u) => u.email).sort()).toEqual(demoAccounts.map((a) => a.email).sort());
      for (const row of rows) {
        expect(row.emailVerified).not.toBeNull();
        expect(await bcrypt.compare(DEMO_PASSWORD, row.passwordHash!)).toBe(true);
      }
      const roles = await handle.db
        .select({ email: users.email, role: memberships.role })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(eq(memberships.groupId, demoGroup.id));
      expect(Object.fromEntries(roles.map((r) => [r.email, r.role]))).toEqual({
        "lead@vierbein.test": "lead",
        "author@vierbein.test": "author",
        "coauthor@vierbein.test": "author",
        "reviewer@vierbein.test": "reviewer",
        "reader@vierbein.test": "reader",
      });
      expect(await count(notebooks)).toBeGreaterThanOrEqual(3);
    });

    it("changes nothing in number when run again, and keeps edited documents", async () => {
      const edited = { type: "doc", content: [{ type: "paragraph", content: [{ type: "text", text: "edited by hand" }] }] };
      await handle.db.update(notebooks).set({ content: edited }).where(eq(notebooks.id, demoNotebooks[0].id));
      const before = [await count(users), await count(memberships), await count(notebooks)];
      await loadDemo({ db: handle.db });
      expect([await count(users), await count(memberships), await count(notebooks)]).toEqual(before);
      const [row] = await handle.db.select().from(notebooks).where(eq(notebooks.id, demoNotebooks[0].id));
      expect(row.content).toEqual(edited);
    });

    it("fills in content a notebook module provides once the row has none, and --reset-content overwrites", async () => {
      const provided = { type: "doc", content: [{ type: "paragraph" }] };
      await handle.db.update(notebooks).set({ content: null }).where(eq(notebooks.id, demoNotebooks[1].id));
      const withContent = demoNotebooks.map((n, i) => (i === 1 ? { ...n, content: provided } : n));
      await loadDemo({ db: handle.db, notebooks: withContent });
      const [filled] = await handle.db.select().from(notebooks).where(eq(notebooks.id, demoNotebooks[1].id));
      expect(filled.content).toEqual(provided);

      const replaced = demoNotebooks.map((n, i) => (i === 0 ? { ...n, content: provided } : n));
      await loadDemo({ db: handle.db, notebooks: replaced, resetContent: true });
      const [reset] = await handle.db.select().from(notebooks).where(eq(notebooks.id, demoNotebooks[0].id));
      expect(reset.content).toEqual(provided);
    });
  });
}
