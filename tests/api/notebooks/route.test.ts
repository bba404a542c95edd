// /api/notebooks and /api/notebooks/:id through their route handlers, per role.
import { closeDb, getDb, jsonRequest, lastAuditEntry, makeUser, noParams, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CurrentUser } from "@/app/_server/auth";
import { GET as listNotebooks, POST as createNotebookRoute } from "@/app/api/notebooks/route";
import { DELETE as deleteNotebookRoute, GET as getNotebookRoute, PATCH as patchNotebook } from "@/app/api/notebooks/[id]/route";
import { createGroupWithLead } from "@/db/queries/groups";
import { addMember } from "@/db/queries/members";
import { createNotebook, getNotebookById, listNotebooksForUser } from "@/db/queries/notebooks";

let lead: CurrentUser, author: CurrentUser, reviewer: CurrentUser, reader: CurrentUser, outsider: CurrentUser;
let groupId: string;
let otherGroupId: string;
let notebookId: string;

beforeAll(async () => {
  const db = await getDb();
  [lead, author, reviewer, reader, outsider] = await Promise.all(["lead", "author", "reviewer", "reader", "outsider"].map(makeUser));
  groupId = (await createGroupWithLead({ db, name: "Orbit group", leadUserId: lead.id })).id;
  otherGroupId = (await createGroupWithLead({ db, name: "Another group", leadUserId: outsider.id })).id;
  await addMember({ db, groupId, userId: author.id, role: "author" });
  await addMember({ db, groupId, userId: reviewer.id, role: "reviewer" });
  await addMember({ db, groupId, userId: reader.id, role: "reader" });
  notebookId = (await createNotebook({ db, groupId, title: "Photon sphere of a compact star", createdBy: author.id })).id;
}, 120_000);
afterAll(() => closeDb());

const notebookPath = (id: string) => `/api/notebooks/${id}`;

describe("GET /api/notebooks", () => {
  it("is 401 when signed out", async () => {
    signInAs(null);
    const response = await listNotebooks(jsonRequest("GET", "/api/notebooks"), noParams);
    expect(response.status).toBe(401);
    expect((await response.json()).error.code).toBe("unauthorized:session");
  });

  it("shows a member their group's notebooks with their role, and an outsider none of them", async () => {
    signInAs(reader);
    const page = await (await listNotebooks(jsonRequest("GET", "/api/notebooks?q=photon&sort=title&dir=asc&page=1&pageSize=10"), noParams)).json();
    expect(page).toMatchObject({ total: 1, page: 1, pageSize: 10 });
    expect(page.items[0]).toMatchObject({ id: notebookId, groupName: "Orbit group", role: "reader" });
    signInAs(outsider);
    const theirs = await (await listNotebooks(jsonRequest("GET", "/api/notebooks"), noParams)).json();
    expect(theirs.items.map((i: { id: string }) => i.id)).not.toContain(notebookId);
  });

  it("rejects unknown sort keys and silly page sizes", async () => {
    signInAs(reader);
    expect((await listNotebooks(jsonRequest("GET", "/api/notebooks?sort=password"), noParams)).status).toBe(400);
    expect((await listNotebooks(jsonRequest("GET", "/api/notebooks?pageSize=100000"), noParams)).status).toBe(400);
    expect((await listNotebooks(jsonRequest("GET", "/api/notebooks?page=-1"), noParams)).status).toBe(400);
  });
});

describe("POST /api/notebooks", () => {
  it("lets an author create a notebook in their group", async () => {
    signInAs(author);
    const response = await createNotebookRoute(jsonRequest("POST", "/api/notebooks", { groupId, title: "  ISCO shift with charge  " }), noParams);
    expect(response.status).toBe(201);
    const { notebook } = await response.json();
    expect(notebook).toMatchObject({ groupId, groupName: "Orbit group", title: "ISCO shift with charge", role: "author" });
    expect(await getNotebookById({ db: await getDb(), id: notebook.id })).not.toBeNull();
  });

  it("refuses a reader, changes nothing and writes the refusal to the audit log", async () => {
    signInAs(reader);
    const before = (await listNotebooksForUser({ db: await getDb(), userId: reader.id })).total;
    const response = await createNotebookRoute(jsonRequest("POST", "/api/notebooks", { groupId, title: "Not allowed" }), noParams);
    expect(response.status).toBe(403);
    expect((await response.json()).error.code).toBe("forbidden:group");
    expect((await listNotebooksForUser({ db: await getDb(), userId: reader.id })).total).toBe(before);
    expect(await lastAuditEntry()).toMatchObject({ actorId: reader.id, action: "notebook:create", outcome: "denied", resourceId: groupId });
  });

  it("refuses another group's id, an unknown group, wrong types and overlong titles", async () => {
    signInAs(author);
    expect((await createNotebookRoute(jsonRequest("POST", "/api/notebooks", { groupId: otherGroupId, title: "Sneaky" }), noParams)).status).toBe(403);
    const unknown = await createNotebookRoute(jsonRequest("POST", "/api/notebooks", { groupId: "8a1f2c3d-0000-4000-8000-000000000000", title: "x" }), noParams);
    expect(unknown.status).toBe(404);
    expect((await unknown.json()).error.code).toBe("not_found:group");
    expect((await createNotebookRoute(jsonRequest("POST", "/api/notebooks", { groupId, title: 12 }), noParams)).status).toBe(400);
    expect((await createNotebookRoute(jsonRequest("POST", "/api/notebooks", { groupId, title: "t".repeat(201) }), noParams)).status).toBe(400);
    expect((await createNotebookRoute(jsonRequest("POST", "/api/notebooks", { groupId, title: "   " }), noParams)).status).toBe(400);
    expect((await createNotebookRoute(jsonRequest("POST", "/api/notebooks", "{\"groupId\":"), noParams)).status).toBe(400);
    expect((await createNotebookRoute(jsonRequest("POST", "/api/notebooks", { groupId: "not-a-uuid", title: "x" }), noParams)).status).toBe(400);
  });
});

describe("/api/notebooks/:id", () => {
  it("GET shows a member the notebook and what they may do; an outsider gets 403; an unknown id 404; a bad id 400", async () => {
    signInAs(reviewer);
    const response = await getNotebookRoute(jsonRequest("GET", notebookPath(notebookId)), routeParams({ id: notebookId }));
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.notebook).toMatchObject({ id: notebookId, role: "reviewer", content: null });
    expect(body.permissions).toEqual({ edit: false, delete: false, remark: true, publish: false, checkpoint: false });

    signInAs(outsider);
    expect((await getNotebookRoute(jsonRequest("GET", notebookPath(notebookId)), routeParams({ id: notebookId }))).status).toBe(403);
    const missing = "8a1f2c3d-0000-4000-8000-000000000001";
    expect((await getNotebookRoute(jsonRequest("GET", notebookPath(missing)), routeParams({ id: missing }))).status).toBe(404);
    expect((await getNotebookRoute(jsonRequest("GET", notebookPath("abc")), routeParams({ id: "abc" }))).status).toBe(400);
  });

  it("PATCH renames for an author, and a reviewer's attempt changes nothing", async () => {
    signInAs(reviewer);
    const refused = await patchNotebook(jsonRequest("PATCH", notebookPath(notebookId), { title: "Reviewer's title" }), routeParams({ id: notebookId }));
    expect(refused.status).toBe(403);
    expect((await getNotebookById({ db: await getDb(), id: notebookId }))!.title).toBe("Photon sphere of a compact star");
    expect(await lastAuditEntry()).toMatchObject({ actorId: reviewer.id, action: "notebook:edit", outcome: "denied" });

    signInAs(author);
    const renamed = await patchNotebook(jsonRequest("PATCH", notebookPath(notebookId), { title: "Photon sphere, revisited" }), routeParams({ id: notebookId }));
    expect(renamed.status).toBe(200);
    expect((await renamed.json()).notebook.title).toBe("Photon sphere, revisited");

    expect((await patchNotebook(jsonRequest("PATCH", notebookPath(notebookId), {}), routeParams({ id: notebookId }))).status).toBe(400);
    expect((await patchNotebook(jsonRequest("PATCH", notebookPath(notebookId), { groupId: otherGroupId }), routeParams({ id: notebookId }))).status).toBe(400);
  });

  it("DELETE is for the lead only", async () => {
    const db = await getDb();
    const doomed = await createNotebook({ db, groupId, title: "Scratch work", createdBy: author.id });
    signInAs(author);
    expect((await deleteNotebookRoute(jsonRequest("DELETE", notebookPath(doomed.id)), routeParams({ id: doomed.id }))).status).toBe(403);
    expect(await getNotebookById({ db, id: doomed.id })).not.toBeNull();
    signInAs(lead);
    const deleted = await deleteNotebookRoute(jsonRequest("DELETE", notebookPath(doomed.id)), routeParams({ id: doomed.id }));
    expect(deleted.status).toBe(200);
    expect(await getNotebookById({ db, id: doomed.id })).toBeNull();
    expect((await deleteNotebookRoute(jsonRequest("DELETE", notebookPath(doomed.id)), routeParams({ id: doomed.id }))).status).toBe(404);
  });
});
