// admitToGroup / admitToNotebook: the order of the answers every guarded route gives (401, then 404, then 403).
import { closeDb, getDb, lastAuditEntry, makeUser, signInAs } from "../../api/support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CurrentUser } from "@/app/_server/auth";
import { AppError } from "@/app/_server/errors";
import { admitToGroup, admitToNotebook } from "@/app/_server/guard";
import { createGroupWithLead } from "@/db/queries/groups";
import { createNotebook } from "@/db/queries/notebooks";

const missing = "00000000-0000-4000-8000-000000000000";
const request = new Request("http://localhost/api/anything", { method: "POST", headers: { "x-forwarded-for": "203.0.113.7" } });
let lead: CurrentUser, stranger: CurrentUser;
let groupId: string, notebookId: string;

beforeAll(async () => {
  const db = await getDb();
  [lead, stranger] = await Promise.all(["lead", "stranger"].map(makeUser));
  groupId = (await createGroupWithLead({ db, name: "Strong-Field Orbits", leadUserId: lead.id })).id;
  notebookId = (await createNotebook({ db, groupId, title: "Kestrel-7 orbits", createdBy: lead.id })).id;
}, 120_000);
afterAll(() => closeDb());

async function codeOf(attempt: Promise<unknown>): Promise<string> {
  const error = await attempt.then(() => null, (thrown: unknown) => thrown);
  return error instanceof AppError ? error.code : String(error);
}

describe("admitToGroup", () => {
  it("answers 401 to the signed-out before it looks the group up", async () => {
    signInAs(null);
    expect(await codeOf(admitToGroup({ groupId: missing, action: "group:read", request }))).toBe("unauthorized:session");
  });

  it("answers 404 for a missing group before it asks who may touch it", async () => {
    signInAs(stranger);
    expect(await codeOf(admitToGroup({ groupId: missing, action: "group:read", request }))).toBe("not_found:group");
  });

  it("refuses a non-member with 403 and writes the attempt to the audit log", async () => {
    signInAs(stranger);
    expect(await codeOf(admitToGroup({ groupId, action: "group:read", request }))).toBe("forbidden:group");
    expect(await lastAuditEntry()).toMatchObject({ actorId: stranger.id, action: "group:read", resourceId: groupId, outcome: "denied" });
  });

  it("lets the lead through with the group, their roles and the resource to ask `can` about", async () => {
    signInAs(lead);
    const admitted = await admitToGroup({ groupId, action: "group:manage-members", request });
    expect(admitted.group.id).toBe(groupId);
    expect(admitted.user.id).toBe(lead.id);
    expect(admitted.actor?.roles[groupId]).toBe("lead");
    expect(admitted.resource).toEqual({ type: "group", groupId });
  });
});

describe("admitToNotebook", () => {
  it("answers 401, then 404 not_found:notebook, then 403 forbidden:notebook, in that order", async () => {
    signInAs(null);
    expect(await codeOf(admitToNotebook({ notebookId: missing, action: "notebook:read", request }))).toBe("unauthorized:session");
    signInAs(stranger);
    expect(await codeOf(admitToNotebook({ notebookId: missing, action: "notebook:read", request }))).toBe("not_found:notebook");
    expect(await codeOf(admitToNotebook({ notebookId, action: "notebook:read", request }))).toBe("forbidden:notebook");
    expect(await lastAuditEntry()).toMatchObject({ actorId: stranger.id, action: "notebook:read", resourceId: notebookId, outcome: "denied" });
  });

  it("lets the lead through with the notebook and its resource", async () => {
    signInAs(lead);
    const admitted = await admitToNotebook({ notebookId, action: "notebook:delete", request });
    expect(admitted.notebook.id).toBe(notebookId);
    expect(admitted.resource).toEqual({ type: "notebook", groupId, notebookId });
  });
});
