import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DbHandle } from "@/db/client";
import { editions, groups, notebooks } from "@/db/schema";
import { variants } from "./harness";

for (const variant of variants) {
  describe.skipIf(!variant.enabled)(`migrations on ${variant.name}`, () => {
    let handle: DbHandle;
    let editionId: string;
    beforeAll(async () => {
      handle = await variant.open();
      const [group] = await handle.db.insert(groups).values({ name: "Frozen" }).returning();
      const [notebook] = await handle.db.insert(notebooks).values({ groupId: group.id, title: "Frozen" }).returning();
      const [edition] = await handle.db
        .insert(editions)
        .values({ notebookId: notebook.id, number: 1, title: "Frozen", content: { type: "doc" }, sha256: "a".repeat(64), ledger: [] })
        .returning();
      editionId = edition.id;
    });
    afterAll(async () => {
      await handle?.close();
    });

    it("makes edition rows immutable, even to raw SQL", async () => {
      await expect(handle.db.execute(sql`update editions set title = 'changed' where id = ${editionId}`)).rejects.toThrow();
      await expect(handle.db.execute(sql`delete from editions where id = ${editionId}`)).rejects.toThrow();
      await expect(handle.db.execute(sql`truncate editions`)).rejects.toThrow();
      const rows = (await handle.db.execute(sql`select title from editions where id = ${editionId}`)) as unknown as { rows: { title: string }[] };
      expect(rows.rows).toEqual([{ title: "Frozen" }]);
    });

    it("records each applied migration once", async () => {
      const applied = (await handle.db.execute(sql`select count(*)::int as n from drizzle.__drizzle_migrations`)) as unknown as { rows: { n: number }[] };
      expect(applied.rows[0].n).toBe(2);
    });
  });
}
