// Checkpoints through their route handlers: save by hand, list, diff by step id, restore
// (with a before-restore checkpoint, through editNotebookDocument, also into a live room).
import { closeDb, getDb, jsonRequest, makeUser, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { JSONContent } from "@tiptap/core";
import type { CurrentUser } from "@/app/_server/auth";
import { GET as listRoute, POST as saveRoute } from "@/app/api/notebooks/[id]/checkpoints/route";
import { POST as restoreRoute } from "@/app/api/notebooks/[id]/checkpoints/[cid]/restore/route";
import { GET as diffRoute } from "@/app/api/notebooks/[id]/checkpoints/[cid]/diff/[other]/route";
import { editNotebookDocument, readNotebookDocument, replaceWithJson } from "@/app/_server/collab/documents";
import { saveDueAutoCheckpoints } from "@/app/_server/checkpoints/auto";
import { createGroupWithLead } from "@/db/queries/groups";
import { addMember } from "@/db/queries/members";
import { createNotebook } from "@/db/queries/notebooks";
import { listCheckpoints } from "@/db/queries/checkpoints";
import { notebooks } from "@/db/schema";
import { readJSONFromYDoc } from "@/editor/collaboration";
import { extractDerivation } from "@/editor/derivation";
import { eq } from "drizzle-orm";
import { connectClient, startCollabServer, synced, waitFor } from "../../app/_server/collab/harness";

let lead: CurrentUser, author: CurrentUser, reader: CurrentUser;
let notebookId: string;

const step = (id: string, relation: string, kind = "algebra", detail = ""): JSONContent => ({
  type: "step",
  attrs: { id, kind, detail, cites: [], follows: null },
  content: [{ type: "text", text: relation }],
});
const doc = (...content: JSONContent[]): JSONContent => ({ type: "doc", content });

// Version 1: y = (a+b)^2 expanded correctly. Version 2: step s2 changed to a wrong expansion,
// s3 removed, s4 added. (a+b)^2 = a^2 + 2ab + b^2 — the binomial formula, common practice.
const version1 = doc(
  { type: "heading", attrs: { level: 2 }, content: [{ type: "text", text: "Square" }] },
  step("s1", "y = (a+b)^2"),
  step("s2", "y = a^2 + 2ab + b^2"),
  step("s3", "y - 2ab = a^2 + b^2"),
);
const version2 = doc(
  { type: "heading", attrs: { level: 2 }, content: [{ type: "text", text: "Square" }] },
  step("s1", "y = (a+b)^2"),
  step("s2", "y = a^2 + ab + b^2"),
  step("s4", "y - a^2 = ab + b^2"),
);

const relations = (json: unknown) => extractDerivation(json as JSONContent).steps.map((s) => `${s.id}:${s.relation}`);

async function save(label: string, as: CurrentUser = author) {
  signInAs(as);
  return saveRoute(jsonRequest("POST", `/api/notebooks/${notebookId}/checkpoints`, { label }), routeParams({ id: notebookId }));
}

beforeAll(async () => {
  const db = await getDb();
  [lead, author, reader] = await Promise.all(["lead", "author", "reader"].map(makeUser));
  const groupId = (await createGroupWithLead({ db, name: "Checkpoint group", leadUserId: lead.id })).id;
  await addMember({ db, groupId, userId: author.id, role: "author" });
  await addMember({ db, groupId, userId: reader.id, role: "reader" });
  notebookId = (await createNotebook({ db, groupId, title: "Squares", createdBy: author.id, content: version1 as Record<string, unknown> })).id;
}, 120_000);
afterAll(() => closeDb());

describe("checkpoints", () => {
  let first: string;
  let second: string;

  it("saves a labelled checkpoint of the live document and lists it with its author", async () => {
    const response = await save("Before the referee");
    expect(response.status).toBe(201);
    first = (await response.json()).checkpoint.id;
    await editNotebookDocument({ db: await getDb(), notebookId, userId: author.id, edit: replaceWithJson(version2 as Record<string, unknown>) });
    second = (await (await save("After the referee")).json()).checkpoint.id;

    signInAs(reader);
    const list = await (await listRoute(jsonRequest("GET", `/api/notebooks/${notebookId}/checkpoints`), routeParams({ id: notebookId }))).json();
    expect(list.checkpoints.map((c: { label: string }) => c.label)).toEqual(["After the referee", "Before the referee"]);
    expect(list.checkpoints[0]).toMatchObject({ kind: "manual", createdBy: author.id, createdByName: "author" });
  });

  it("refuses a reader and an empty label", async () => {
    expect((await save("Not mine", reader)).status).toBe(403);
    expect((await save("   ")).status).toBe(400);
  });

  it("diffs two checkpoints by step id, with each side's verdict", async () => {
    signInAs(reader);
    const response = await diffRoute(jsonRequest("GET", "/x"), routeParams({ id: notebookId, cid: first, other: second }));
    expect(response.status).toBe(200);
    const diff = await response.json();
    expect(diff.unchanged).toBe(1);
    expect(diff.otherContentChanged).toBe(false);
    const byId = Object.fromEntries(diff.steps.map((s: { id: string }) => [s.id, s]));
    expect(byId.s2).toMatchObject({ change: "changed", fields: ["relation"], before: { verdict: "verified" }, after: { verdict: "refuted" } });
    expect(byId.s2.after.witness).toBeTruthy();
    expect(byId.s3).toMatchObject({ change: "removed", before: { number: 3 } });
    expect(byId.s4).toMatchObject({ change: "added", after: { number: 3, relation: "y - a^2 = ab + b^2" } });
    expect(byId.s1).toBeUndefined();
  }, 60_000);

  it("answers 404 for a checkpoint of another notebook", async () => {
    signInAs(reader);
    const response = await diffRoute(jsonRequest("GET", "/x"), routeParams({ id: notebookId, cid: first, other: "8a1f2c3d-0000-4000-8000-000000000000" }));
    expect(response.status).toBe(404);
  });

  it("restores a checkpoint through the document, after saving what was there, and keeps the later history", async () => {
    signInAs(author);
    const response = await restoreRoute(jsonRequest("POST", "/x"), routeParams({ id: notebookId, cid: first }));
    expect(response.status).toBe(200);
    const { before } = await response.json();
    expect(before.kind).toBe("before-restore");
    const current = await readNotebookDocument({ db: await getDb(), notebookId });
    expect(relations(current!.json)).toEqual(relations(version1));
    const all = await listCheckpoints({ db: await getDb(), notebookId });
    expect(all.map((c) => c.label)).toContain("After the referee");
    expect(all[0]).toMatchObject({ id: before.id, kind: "before-restore" });
  });

  it("lets a reader read but not restore", async () => {
    signInAs(reader);
    expect((await restoreRoute(jsonRequest("POST", "/x"), routeParams({ id: notebookId, cid: second }))).status).toBe(403);
  });

  it("restores into an open room: a connected co-author sees the restored content", async () => {
    const server = await startCollabServer(await getDb(), { register: true });
    try {
      const client = connectClient(server, notebookId, author.id);
      await synced(client.provider);
      expect(relations(readJSONFromYDoc(client.doc))).toEqual(relations(version1));
      signInAs(author);
      const response = await restoreRoute(jsonRequest("POST", "/x"), routeParams({ id: notebookId, cid: second }));
      expect(response.status).toBe(200);
      await waitFor(() => relations(readJSONFromYDoc(client.doc)).join() === relations(version2).join(), 10_000, "restored content");
      client.provider.destroy();
    } finally {
      await server.close();
    }
  });

  it("saves an automatic checkpoint once a notebook edited since its last one has been idle, at most one per period", async () => {
    const db = await getDb();
    const policy = { everyMinutes: 10, idleSeconds: 60 };
    const later = new Date(Date.now() + 5 * 60_000);
    // The restore above edited the notebook after its last checkpoint.
    await db.update(notebooks).set({ updatedAt: new Date() }).where(eq(notebooks.id, notebookId));
    expect(await saveDueAutoCheckpoints({ db, policy, now: new Date() })).not.toContain(notebookId); // not idle yet
    expect(await saveDueAutoCheckpoints({ db, policy, now: later })).toContain(notebookId);
    const [latest] = await listCheckpoints({ db, notebookId });
    expect(latest).toMatchObject({ kind: "auto", createdBy: null });
    // Edited again within the period: no second automatic checkpoint yet.
    await editNotebookDocument({ db, notebookId, userId: author.id, edit: replaceWithJson(version1 as Record<string, unknown>) });
    await db.update(notebooks).set({ updatedAt: new Date(Date.now() + 60_000) }).where(eq(notebooks.id, notebookId));
    expect(await saveDueAutoCheckpoints({ db, policy, now: new Date(Date.now() + 3 * 60_000) })).not.toContain(notebookId);
    expect(await saveDueAutoCheckpoints({ db, policy, now: new Date(Date.now() + 20 * 60_000) })).toContain(notebookId);
  });
});
