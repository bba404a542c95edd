// Editions through their route handlers: publishing re-runs every check in the worker pool,
// refuses while a step is refuted unless the lead gives a reason, numbers editions per
// notebook, and the rows can never change — not through the API, not even with raw SQL.
import { closeDb, getDb, jsonRequest, makeUser, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql } from "drizzle-orm";
import type { CurrentUser } from "@/app/_server/auth";
import { GET as listRoute, POST as publishRoute } from "@/app/api/notebooks/[id]/editions/route";
import { DELETE as deleteRoute, GET as getRoute, PATCH as patchRoute, PUT as putRoute } from "@/app/api/notebooks/[id]/editions/[number]/route";
import { editionSha256 } from "@/app/_server/editions/canonical";
import { createGroupWithLead } from "@/db/queries/groups";
import { addMember } from "@/db/queries/members";
import { createNotebook } from "@/db/queries/notebooks";
import { buildVesperReissnerNordstrom } from "@/db/demo/notebooks/vesper-reissner-nordstrom";
import { mailMessages } from "@/db/schema";

let lead: CurrentUser, author: CurrentUser;
let notebookId: string;
let emptyNotebookId: string;

const publish = (body: unknown, as: CurrentUser = lead, id = notebookId) => {
  signInAs(as);
  return publishRoute(jsonRequest("POST", `/api/notebooks/${id}/editions`, body), routeParams({ id }));
};

beforeAll(async () => {
  const db = await getDb();
  [lead, author] = await Promise.all(["lead", "author"].map(makeUser));
  const groupId = (await createGroupWithLead({ db, name: "Edition group", leadUserId: lead.id })).id;
  await addMember({ db, groupId, userId: author.id, role: "author" });
  // The demo's Reissner–Nordström draft carries a deliberate sign slip in step 17
  // (tests/editor/demo-notebooks.test.ts confirms it is wrong with SymPy).
  notebookId = (await createNotebook({ db, groupId, title: "Vesper-3 orbits", createdBy: author.id, content: buildVesperReissnerNordstrom() as Record<string, unknown> })).id;
  emptyNotebookId = (await createNotebook({ db, groupId, title: "Nothing yet", createdBy: author.id })).id;
}, 120_000);
afterAll(() => closeDb());

describe("publishing an edition", () => {
  it("is for the group lead only", async () => {
    const response = await publish({ reason: "trying" }, author);
    expect(response.status).toBe(403);
  });

  it("is refused with 409 while a step is refuted and no reason is given; nothing is stored", async () => {
    const response = await publish({});
    expect(response.status).toBe(409);
    const body = await response.json();
    expect(body.error.code).toBe("conflict:refuted");
    expect(body.refuted.map((e: { number: number }) => e.number)).toContain(17);
    expect(body.refuted[0].witness).toBeTruthy();
    signInAs(null);
    expect((await listRoute(jsonRequest("GET", "/x"), routeParams({ id: notebookId }))).status).toBe(404);
  }, 180_000);

  it("publishes with a reason: 201 with number, SHA-256 and the ledger of every step", async () => {
    const response = await publish({ reason: "Step 17 is kept as the referee's example of the sign slip." });
    expect(response.status).toBe(201);
    const body = await response.json();
    expect(body.number).toBe(1);
    expect(body.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(body.ledger).toHaveLength(25);
    expect(body.ledger[16]).toMatchObject({ number: 17, verdict: "refuted" });
    expect(body.ledger.filter((e: { verdict: string }) => e.verdict === "verified").length).toBeGreaterThan(10);
    for (const entry of body.ledger) expect(["verified", "refuted", "undecided"]).toContain(entry.verdict);
    expect(body.ledger[0]).toEqual(expect.objectContaining({ id: expect.any(String), relation: expect.any(String), justification: expect.any(Object), method: expect.any(Object) }));
  }, 180_000);

  it("numbers editions per notebook", async () => {
    const response = await publish({ reason: "Second printing." });
    expect((await response.json()).number).toBe(2);
    const other = await publish({}, lead, emptyNotebookId);
    expect(other.status).toBe(201);
    expect((await other.json()).number).toBe(1);
  }, 180_000);

  it("tells the group by mail", async () => {
    const rows = await (await getDb()).select().from(mailMessages);
    expect(rows.some((m) => /Edition 2 of Vesper-3 orbits/.test(m.subject))).toBe(true);
  });
});

describe("reading an edition", () => {
  it("is public: the list and the frozen edition read signed out, with a citation and a hash anyone can recompute", async () => {
    signInAs(null);
    const list = await (await listRoute(jsonRequest("GET", "/x"), routeParams({ id: notebookId }))).json();
    expect(list.editions.map((e: { number: number }) => e.number)).toEqual([1, 2]);
    expect(list.editions[0].tally.refuted).toBe(1);
    const response = await getRoute(jsonRequest("GET", "/x"), routeParams({ id: notebookId, number: "1" }));
    expect(response.status).toBe(200);
    const { edition } = await response.json();
    expect(edition.bibtex).toMatch(/^@misc\{vierbein-[0-9a-f]{8}-e1,/);
    expect(edition.bibtex).toContain(`/editions/${notebookId}/1`);
    expect(editionSha256({ notebookId, number: 1, title: edition.title, content: edition.content, ledger: edition.ledger, reason: edition.reason })).toBe(edition.sha256);
  });

  it("answers 404 for an edition that does not exist and 400 for a malformed number", async () => {
    expect((await getRoute(jsonRequest("GET", "/x"), routeParams({ id: notebookId, number: "9" }))).status).toBe(404);
    expect((await getRoute(jsonRequest("GET", "/x"), routeParams({ id: notebookId, number: "one" }))).status).toBe(400);
  });
});

describe("an edition never changes", () => {
  it("answers PATCH, PUT and DELETE with 405", async () => {
    signInAs(lead);
    for (const handler of [patchRoute, putRoute, deleteRoute]) {
      const response = await handler(jsonRequest("PATCH", "/x", { title: "changed" }), routeParams({ id: notebookId, number: "1" }));
      expect(response.status).toBe(405);
      expect(response.headers.get("allow")).toBe("GET");
      expect((await response.json()).error.code).toBe("method_not_allowed:edition");
    }
  });

  it("cannot be updated or deleted even with raw SQL", async () => {
    const db = await getDb();
    await expect(db.execute(sql`UPDATE editions SET title = 'tampered' WHERE notebook_id = ${notebookId}`)).rejects.toThrow();
    await expect(db.execute(sql`DELETE FROM editions WHERE notebook_id = ${notebookId}`)).rejects.toThrow();
    await expect(db.execute(sql`TRUNCATE editions`)).rejects.toThrow();
    const rows = (await db.execute(sql`SELECT title FROM editions WHERE notebook_id = ${notebookId}`)) as unknown as { rows: { title: string }[] };
    const titles = rows.rows;
    expect(titles.map((r) => r.title)).toEqual(["Vesper-3 orbits", "Vesper-3 orbits"]);
  });
});
