import { describe, expect, it } from "vitest";
import { actions, can, roles, type Action, type Actor, type Role } from "@/app/_server/authz";
import { roleEnum } from "@/db/schema";

// The permission matrix as the product defines it (GLOSSARY: lead manages members and
// publishes; author writes; reviewer reads and remarks; reader reads). Written out by hand
// so a change to authz.ts that drifts from it fails here.
const Y = true;
const N = false;
const expected: Record<Action, Record<Role | "non-member" | "signed-out", boolean>> = {
  //                          lead author reviewer reader non-member signed-out
  "group:create":           { lead: Y, author: Y, reviewer: Y, reader: Y, "non-member": Y, "signed-out": N },
  "group:read":             { lead: Y, author: Y, reviewer: Y, reader: Y, "non-member": N, "signed-out": N },
  "group:update":           { lead: Y, author: N, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "group:manage-members":   { lead: Y, author: N, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "notebook:create":        { lead: Y, author: Y, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "notebook:read":          { lead: Y, author: Y, reviewer: Y, reader: Y, "non-member": N, "signed-out": N },
  "notebook:edit":          { lead: Y, author: Y, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "notebook:delete":        { lead: Y, author: N, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "notebook:remark":        { lead: Y, author: Y, reviewer: Y, reader: N, "non-member": N, "signed-out": N },
  "notebook:settle-remark": { lead: Y, author: Y, reviewer: Y, reader: N, "non-member": N, "signed-out": N },
  "notebook:checkpoint":    { lead: Y, author: Y, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "notebook:restore":       { lead: Y, author: Y, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "notebook:publish":       { lead: Y, author: N, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "notebook:attach":        { lead: Y, author: Y, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  "notebook:export":        { lead: Y, author: Y, reviewer: Y, reader: Y, "non-member": N, "signed-out": N },
  "notebook:request-review":{ lead: Y, author: Y, reviewer: N, reader: N, "non-member": N, "signed-out": N },
  // Editions are citable: anyone with the permanent link may read them.
  "edition:read":           { lead: Y, author: Y, reviewer: Y, reader: Y, "non-member": Y, "signed-out": Y },
};

const groupId = "g-1";
const otherGroupId = "g-2";

function actorFor(who: Role | "non-member" | "signed-out"): Actor {
  if (who === "signed-out") return null;
  // A non-member still has roles, but only in another group.
  if (who === "non-member") return { id: "u-x", roles: { [otherGroupId]: "lead" } };
  return { id: `u-${who}`, roles: { [groupId]: who } };
}

function resourceFor(action: Action) {
  if (action === "group:create") return { type: "app" } as const;
  if (action.startsWith("group:") || action === "notebook:create") return { type: "group", groupId } as const;
  return { type: "notebook", groupId, notebookId: "n-1" } as const;
}

describe("can: every role × every action", () => {
  it("knows exactly the roles the database stores", () => {
    expect([...roles].sort()).toEqual([...roleEnum.enumValues].sort());
  });

  it("covers every action the module declares", () => {
    expect(Object.keys(expected).sort()).toEqual([...actions].sort());
  });

  for (const action of actions) {
    for (const who of [...roles, "non-member", "signed-out"] as const) {
      it(`${who} ${expected[action][who] ? "may" : "may not"} ${action}`, () => {
        expect(can(actorFor(who), action, resourceFor(action) as never)).toBe(expected[action][who]);
      });
    }
  }

  it("decides by the role in the resource's own group, not a role elsewhere", () => {
    const leadElsewhere: Actor = { id: "u", roles: { [otherGroupId]: "lead", [groupId]: "reader" } };
    expect(can(leadElsewhere, "notebook:edit", { type: "notebook", groupId, notebookId: "n" })).toBe(false);
    expect(can(leadElsewhere, "notebook:edit", { type: "notebook", groupId: otherGroupId, notebookId: "n" })).toBe(true);
  });
});
