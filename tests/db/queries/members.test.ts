import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DbHandle } from "@/db/client";
import { createGroupWithLead, listGroupsForUser } from "@/db/queries/groups";
import { addMember, changeMember, listMembers } from "@/db/queries/members";
import { getRolesForUser } from "@/db/queries/roles";
import { createUser } from "@/db/queries/users";
import { variants } from "../harness";

for (const variant of variants) {
  describe.skipIf(!variant.enabled)(`groups and members on ${variant.name}`, () => {
    let handle: DbHandle;
    beforeAll(async () => {
      handle = await variant.open();
    });
    afterAll(async () => {
      await handle?.close();
    });

    async function people(...names: string[]) {
      return Promise.all(names.map((name) => createUser({ db: handle.db, email: `${name}-${Math.random().toString(36).slice(2)}@example.test`, name })));
    }

    it("makes the creator of a group its lead", async () => {
      const [ada] = await people("ada");
      const group = await createGroupWithLead({ db: handle.db, name: "Geodesics", leadUserId: ada.id });
      expect(await getRolesForUser({ db: handle.db, userId: ada.id })).toEqual({ [group.id]: "lead" });
      const [summary] = await listGroupsForUser({ db: handle.db, userId: ada.id });
      expect(summary).toMatchObject({ id: group.id, name: "Geodesics", role: "lead", memberCount: 1 });
    });

    it("refuses to add someone twice and keeps their first role", async () => {
      const [lead, bo] = await people("lead", "bo");
      const group = await createGroupWithLead({ db: handle.db, name: "Twice", leadUserId: lead.id });
      expect(await addMember({ db: handle.db, groupId: group.id, userId: bo.id, role: "reader" })).not.toBeNull();
      expect(await addMember({ db: handle.db, groupId: group.id, userId: bo.id, role: "author" })).toBeNull();
      const members = await listMembers({ db: handle.db, groupId: group.id });
      expect(members.find((m) => m.userId === bo.id)?.role).toBe("reader");
    });

    it("never lets the last lead be demoted or removed", async () => {
      const [lead, other] = await people("lead", "other");
      const group = await createGroupWithLead({ db: handle.db, name: "One lead", leadUserId: lead.id });
      await addMember({ db: handle.db, groupId: group.id, userId: other.id, role: "author" });
      expect(await changeMember({ db: handle.db, groupId: group.id, userId: lead.id, role: "author" })).toEqual({ ok: false, reason: "last_lead" });
      expect(await changeMember({ db: handle.db, groupId: group.id, userId: lead.id, role: null })).toEqual({ ok: false, reason: "last_lead" });
      expect((await getRolesForUser({ db: handle.db, userId: lead.id }))[group.id]).toBe("lead");

      // With a second lead, the first may step down.
      expect((await changeMember({ db: handle.db, groupId: group.id, userId: other.id, role: "lead" })).ok).toBe(true);
      expect((await changeMember({ db: handle.db, groupId: group.id, userId: lead.id, role: "reviewer" })).ok).toBe(true);
      expect((await getRolesForUser({ db: handle.db, userId: lead.id }))[group.id]).toBe("reviewer");
    });

    it("keeps one lead when two leads demote each other at the same moment", async () => {
      const [a, b] = await people("a", "b");
      const group = await createGroupWithLead({ db: handle.db, name: "Race", leadUserId: a.id });
      await addMember({ db: handle.db, groupId: group.id, userId: b.id, role: "lead" });
      const results = await Promise.all([
        changeMember({ db: handle.db, groupId: group.id, userId: a.id, role: "author" }),
        changeMember({ db: handle.db, groupId: group.id, userId: b.id, role: "author" }),
      ]);
      expect(results.filter((r) => r.ok)).toHaveLength(1);
      const leads = (await listMembers({ db: handle.db, groupId: group.id })).filter((m) => m.role === "lead");
      expect(leads).toHaveLength(1);
    });

    it("reports a non-member instead of changing anything", async () => {
      const [lead, stranger] = await people("lead", "stranger");
      const group = await createGroupWithLead({ db: handle.db, name: "Strangers", leadUserId: lead.id });
      expect(await changeMember({ db: handle.db, groupId: group.id, userId: stranger.id, role: "author" })).toEqual({ ok: false, reason: "not_member" });
    });
  });
}
