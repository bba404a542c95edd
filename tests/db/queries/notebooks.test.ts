import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DbHandle } from "@/db/client";
import { createGroupWithLead } from "@/db/queries/groups";
import { addMember } from "@/db/queries/members";
import { createNotebook, deleteNotebook, getNotebookById, listNotebooksForUser, updateNotebook } from "@/db/queries/notebooks";
import { createUser } from "@/db/queries/users";
import { editions } from "@/db/schema";
import { variants } from "../harness";

for (const variant of variants) {
  describe.skipIf(!variant.enabled)(`notebooks on ${variant.name}`, () => {
    let handle: DbHandle;
    let reader: { id: string };
    let outsider: { id: string };
    let groupId: string;
    let otherGroupId: string;

    beforeAll(async () => {
      handle = await variant.open();
      const db = handle.db;
      const lead = await createUser({ db, email: "lead@example.test", name: "Lead" });
      reader = await createUser({ db, email: "reader@example.test", name: "Reader" });
      outsider = await createUser({ db, email: "outsider@example.test", name: "Outsider" });
      groupId = (await createGroupWithLead({ db, name: "Orbits", leadUserId: lead.id })).id;
      otherGroupId = (await createGroupWithLead({ db, name: "Elsewhere", leadUserId: outsider.id })).id;
      await addMember({ db, groupId, userId: reader.id, role: "reader" });
      const titles = ["Perihelion shift", "ISCO of a charged hole", "Photon sphere", "Deflection of light", "Redshift at r_s"];
      for (const title of titles) await createNotebook({ db, groupId, title, createdBy: lead.id });
      await createNotebook({ db, groupId: otherGroupId, title: "Hidden from the reader", createdBy: outsider.id });
      await createNotebook({ db, groupId, title: "Orbit with 100% eccentricity", createdBy: lead.id });
    });
    afterAll(async () => {
      await handle?.close();
    });

    it("lists only notebooks of the user's groups, with their role", async () => {
      const page = await listNotebooksForUser({ db: handle.db, userId: reader.id, pageSize: 100 });
      expect(page.total).toBe(6);
      expect(page.items.every((item) => item.groupId === groupId && item.role === "reader" && item.groupName === "Orbits")).toBe(true);
      expect(page.items.map((i) => i.title)).not.toContain("Hidden from the reader");
    });

    it("sorts by title both ways and pages without overlap", async () => {
      const asc = await listNotebooksForUser({ db: handle.db, userId: reader.id, sort: "title", dir: "asc", pageSize: 100 });
      const titles = asc.items.map((i) => i.title);
      expect(titles).toEqual([...titles].sort((a, b) => a.toLowerCase().localeCompare(b.toLowerCase())));
      const desc = await listNotebooksForUser({ db: handle.db, userId: reader.id, sort: "title", dir: "desc", pageSize: 100 });
      expect(desc.items.map((i) => i.title)).toEqual([...titles].reverse());

      const first = await listNotebooksForUser({ db: handle.db, userId: reader.id, sort: "title", dir: "asc", page: 1, pageSize: 4 });
      const second = await listNotebooksForUser({ db: handle.db, userId: reader.id, sort: "title", dir: "asc", page: 2, pageSize: 4 });
      expect(first.items).toHaveLength(4);
      expect(second.items).toHaveLength(2);
      expect([...first.items, ...second.items].map((i) => i.title)).toEqual(titles);
    });

    it("filters case-insensitively and treats % and _ literally", async () => {
      const photon = await listNotebooksForUser({ db: handle.db, userId: reader.id, q: "PHOTON" });
      expect(photon.items.map((i) => i.title)).toEqual(["Photon sphere"]);
      const percent = await listNotebooksForUser({ db: handle.db, userId: reader.id, q: "100%" });
      expect(percent.items.map((i) => i.title)).toEqual(["Orbit with 100% eccentricity"]);
      const underscore = await listNotebooksForUser({ db: handle.db, userId: reader.id, q: "r_s" });
      expect(underscore.items.map((i) => i.title)).toEqual(["Redshift at r_s"]);
      const lonePercent = await listNotebooksForUser({ db: handle.db, userId: reader.id, q: "%" });
      expect(lonePercent.total).toBe(1);
    });

    it("updates the title and moves updatedAt forward", async () => {
      const notebook = await createNotebook({ db: handle.db, groupId, title: "Draft", createdBy: null });
      const updated = await updateNotebook({ db: handle.db, id: notebook.id, changes: { title: "Final" } });
      expect(updated?.title).toBe("Final");
      expect(updated!.updatedAt.getTime()).toBeGreaterThanOrEqual(notebook.updatedAt.getTime());
    });

    it("refuses to delete a notebook that has a published edition", async () => {
      const kept = await createNotebook({ db: handle.db, groupId, title: "Published", createdBy: null });
      await handle.db.insert(editions).values({ notebookId: kept.id, number: 1, title: "Published", content: {}, sha256: "0".repeat(64), ledger: [] });
      expect(await deleteNotebook({ db: handle.db, id: kept.id })).toBe("has_editions");
      expect(await getNotebookById({ db: handle.db, id: kept.id })).not.toBeNull();

      const gone = await createNotebook({ db: handle.db, groupId, title: "Scratch", createdBy: null });
      expect(await deleteNotebook({ db: handle.db, id: gone.id })).toBe("deleted");
      expect(await getNotebookById({ db: handle.db, id: gone.id })).toBeNull();
      expect(await deleteNotebook({ db: handle.db, id: gone.id })).toBe("not_found");
    });
  });
}
