import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { configFromEnv, type DbHandle } from "@/db/client";
import { notebookUpdates, notebooks, groups } from "@/db/schema";
import { variants } from "./harness";

describe("configFromEnv", () => {
  it("uses PGlite under ./.data unless DATABASE_URL is set", () => {
    expect(configFromEnv({})).toEqual({ kind: "pglite", dataDir: "./.data" });
    expect(configFromEnv({ DATA_DIR: "/srv/vb" })).toEqual({ kind: "pglite", dataDir: "/srv/vb" });
    expect(configFromEnv({ DATABASE_URL: "postgres://x@localhost/vb", DATA_DIR: "/srv/vb" })).toEqual({
      kind: "postgres",
      url: "postgres://x@localhost/vb",
    });
  });
});

for (const variant of variants) {
  describe.skipIf(!variant.enabled)(`database on ${variant.name}`, () => {
    let handle: DbHandle;
    beforeAll(async () => {
      handle = await variant.open();
    });
    afterAll(async () => {
      await handle?.close();
    });

    it("reports its kind and has every table after migrating", async () => {
      expect(handle.kind).toBe(variant.name);
      // Both drivers answer raw SQL with { rows }.
      const result = (await handle.db.execute(
        sql`select table_name from information_schema.tables where table_schema = 'public' order by table_name`,
      )) as unknown as { rows: { table_name: string }[] };
      const names = result.rows.map((row) => row.table_name);
      for (const table of ["users", "groups", "memberships", "notebooks", "audit_log", "verification_tokens", "editions", "remarks", "checkpoints", "attachments", "mail_messages", "notebook_updates"]) {
        expect(names).toContain(table);
      }
    });

    it("round-trips binary Yjs state byte for byte", async () => {
      const [group] = await handle.db.insert(groups).values({ name: "Binary round trip" }).returning();
      const state = new Uint8Array([0, 1, 2, 254, 255, 128, 0, 7]);
      const [notebook] = await handle.db.insert(notebooks).values({ groupId: group.id, title: "bytes", ydoc: state }).returning();
      await handle.db.insert(notebookUpdates).values({ notebookId: notebook.id, data: state.subarray(2, 5) });
      const [readBack] = await handle.db.select().from(notebooks).where(sql`${notebooks.id} = ${notebook.id}`);
      expect(readBack.ydoc).toBeInstanceOf(Uint8Array);
      expect(Array.from(readBack.ydoc!)).toEqual(Array.from(state));
      const [update] = await handle.db.select().from(notebookUpdates).where(sql`${notebookUpdates.notebookId} = ${notebook.id}`);
      expect(Array.from(update.data)).toEqual([2, 254, 255]);
    });
  });
}
