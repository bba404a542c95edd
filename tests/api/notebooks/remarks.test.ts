// Remark threads through GET|POST /api/notebooks/:id/remarks and PATCH /api/remarks/:id: who may
// remark, reply, settle and reopen, and who is mailed (through the local SMTP server).
import { closeDb, getDb, jsonRequest, lastAuditEntry, makeUser, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CurrentUser } from "@/app/_server/auth";
import { GET as listRemarks, POST as postRemark } from "@/app/api/notebooks/[id]/remarks/route";
import { PATCH as patchRemark } from "@/app/api/remarks/[id]/route";
import { stopLocalSmtpServer } from "@/app/_server/mail";
import { createGroupWithLead } from "@/db/queries/groups";
import { listMailMessages } from "@/db/queries/mail";
import { addMember } from "@/db/queries/members";
import { createNotebook } from "@/db/queries/notebooks";

let lead: CurrentUser, author: CurrentUser, coauthor: CurrentUser, reviewer: CurrentUser, reader: CurrentUser, outsider: CurrentUser;
let notebookId: string;

const content = {
  type: "doc",
  content: [
    { type: "paragraph", content: [{ type: "text", text: "A draft." }] },
    { type: "step", attrs: { id: "st-one", kind: "definition", detail: "", cites: [], follows: null }, content: [{ type: "text", text: "f = 1 - r_s/r" }] },
    { type: "step", attrs: { id: "st-two", kind: "algebra", detail: "", cites: [], follows: null }, content: [{ type: "text", text: "f(r_s) = 0" }] },
  ],
};

beforeAll(async () => {
  const db = await getDb();
  [lead, author, coauthor, reviewer, reader, outsider] = await Promise.all(["lead", "author", "coauthor", "reviewer", "reader", "outsider"].map(makeUser));
  const groupId = (await createGroupWithLead({ db, name: "Remark group", leadUserId: lead.id })).id;
  await createGroupWithLead({ db, name: "Elsewhere", leadUserId: outsider.id });
  await addMember({ db, groupId, userId: author.id, role: "author" });
  await addMember({ db, groupId, userId: coauthor.id, role: "author" });
  await addMember({ db, groupId, userId: reviewer.id, role: "reviewer" });
  await addMember({ db, groupId, userId: reader.id, role: "reader" });
  notebookId = (await createNotebook({ db, groupId, title: "Horizon of a toy metric", content, createdBy: author.id })).id;
}, 120_000);
afterAll(async () => {
  await stopLocalSmtpServer();
  await closeDb();
});

const remarksPath = () => `/api/notebooks/${notebookId}/remarks`;
const post = (body: unknown) => postRemark(jsonRequest("POST", remarksPath(), body), routeParams({ id: notebookId }));
const patch = (id: string, body: unknown) => patchRemark(jsonRequest("PATCH", `/api/remarks/${id}`, body), routeParams({ id }));
const list = async (query = "") => (await listRemarks(jsonRequest("GET", `${remarksPath()}${query}`), routeParams({ id: notebookId }))).json();
const mailsTo = async (address: string) => listMailMessages({ db: await getDb(), to: address });

describe("starting a remark thread", () => {
  it("lets a reviewer remark on a step and mails the authors and the lead, not the reviewer or the reader", async () => {
    signInAs(reviewer);
    const response = await post({ body: "The sign of f at the horizon needs a word.", anchor: { stepId: "st-two" } });
    expect(response.status).toBe(201);
    const { thread } = await response.json();
    expect(thread).toMatchObject({ body: "The sign of f at the horizon needs a word.", settled: false, anchor: { stepId: "st-two" }, author: { id: reviewer.id }, replies: [] });

    for (const person of [author, coauthor, lead]) {
      const [mail] = await mailsTo(person.email);
      expect(mail, `mail to ${person.name}`).toMatchObject({ kind: "remark", subject: "New remark on Horizon of a toy metric (step 2)" });
      expect(mail.text).toContain("The sign of f at the horizon needs a word.");
      expect(mail.text).toContain(`/notebooks/${notebookId}#remarks`);
    }
    expect(await mailsTo(reviewer.email)).toHaveLength(0);
    expect(await mailsTo(reader.email)).toHaveLength(0);
  });

  it("takes a span anchored by Yjs relative positions with the quoted text", async () => {
    signInAs(author);
    const span = { from: Buffer.from([1, 2, 3]).toString("base64"), to: Buffer.from([4, 5, 6]).toString("base64") };
    const response = await post({ body: "Say where r_s comes from.", anchor: { span, quote: "r_s/r" } });
    expect(response.status).toBe(201);
    expect((await response.json()).thread.anchor).toEqual({ span, quote: "r_s/r" });
  });

  it("refuses readers and outsiders, and writes the refusal to the audit log", async () => {
    for (const who of [reader, outsider]) {
      signInAs(who);
      const response = await post({ body: "I may not say this.", anchor: { stepId: "st-one" } });
      expect(response.status).toBe(403);
      expect((await response.json()).error.code).toBe("forbidden:notebook");
      expect(await lastAuditEntry()).toMatchObject({ actorId: who.id, action: "notebook:remark", outcome: "denied" });
    }
    signInAs(null);
    expect((await post({ body: "x", anchor: { stepId: "st-one" } })).status).toBe(401);
  });

  it("says clearly what is wrong with a bad body or anchor", async () => {
    signInAs(reviewer);
    const cases: [unknown, RegExp][] = [
      [{ body: "   ", anchor: { stepId: "st-one" } }, /Write the remark first/],
      [{ body: "x", anchor: {} }, /name a step .* or a span/],
      [{ body: "x", anchor: { stepId: "st-none" } }, /no step with that id/],
      [{ body: "x", anchor: { span: { from: "not base64!", to: "AAA=" } } }, /base64/],
      [{ body: "x", anchor: { stepId: "st-one" }, extra: 1 }, /extra/],
    ];
    for (const [body, message] of cases) {
      const response = await post(body);
      expect(response.status).toBe(400);
      expect((await response.json()).error.message).toMatch(message);
    }
  });
});

describe("replies, settling and reopening", () => {
  it("threads replies and mails everyone in the thread and the authors, never the writer", async () => {
    signInAs(reviewer);
    const { thread } = await (await post({ body: "Is step 1 a definition or a result?", anchor: { stepId: "st-one" } })).json();
    const reviewerMailsBefore = (await mailsTo(reviewer.email)).length;
    const coauthorMailsBefore = (await mailsTo(coauthor.email)).length;

    signInAs(author);
    const replied = await patch(thread.id, { action: "reply", body: "A definition; I will say so." });
    expect(replied.status).toBe(200);
    const after = (await replied.json()).thread;
    expect(after.replies).toHaveLength(1);
    expect(after.replies[0]).toMatchObject({ body: "A definition; I will say so.", author: { id: author.id } });

    const toReviewer = await mailsTo(reviewer.email);
    expect(toReviewer).toHaveLength(reviewerMailsBefore + 1);
    expect(toReviewer[0]).toMatchObject({ kind: "remark-reply", subject: `${author.name} replied to a remark on Horizon of a toy metric` });
    expect(await mailsTo(coauthor.email)).toHaveLength(coauthorMailsBefore + 1);
    expect((await mailsTo(author.email)).filter((m) => m.kind === "remark-reply")).toHaveLength(0);

    // A reply to a reply joins the same thread.
    signInAs(reviewer);
    const nested = await (await patch(after.replies[0].id, { action: "reply", body: "Thanks." })).json();
    expect(nested.thread.id).toBe(thread.id);
    expect(nested.thread.replies.map((r: { body: string }) => r.body)).toEqual(["A definition; I will say so.", "Thanks."]);
  });

  it("settles and reopens a thread; the list filters by open/settled and by who started it", async () => {
    signInAs(reviewer);
    const { thread } = await (await post({ body: "Settle me.", anchor: { stepId: "st-one" } })).json();
    signInAs(author);
    const settled = await (await patch(thread.id, { action: "settle" })).json();
    expect(settled.thread).toMatchObject({ settled: true, settledBy: { id: author.id } });
    expect((await patch(thread.id, { action: "settle" })).status).toBe(409);

    const open = await list("?status=open");
    expect(open.threads.map((t: { id: string }) => t.id)).not.toContain(thread.id);
    expect((await list("?status=settled")).threads.map((t: { id: string }) => t.id)).toEqual([thread.id]);
    const byAuthor = await list(`?author=${author.id}`);
    expect(byAuthor.threads.every((t: { author: { id: string } }) => t.author.id === author.id)).toBe(true);
    expect(byAuthor.threads.length).toBeGreaterThan(0);

    signInAs(reviewer);
    const reopened = await (await patch(thread.id, { action: "reopen" })).json();
    expect(reopened.thread).toMatchObject({ settled: false, settledBy: null, settledAt: null });
  });

  it("lets a reader read the threads but neither reply nor settle", async () => {
    signInAs(reader);
    const listed = await list();
    expect(listed.permissions).toEqual({ remark: false, settle: false });
    const id = listed.threads[0].id;
    expect((await patch(id, { action: "reply", body: "Me too." })).status).toBe(403);
    expect((await patch(id, { action: "settle" })).status).toBe(403);
    signInAs(reviewer);
    expect((await list()).permissions).toEqual({ remark: true, settle: true });
    signInAs(outsider);
    expect((await listRemarks(jsonRequest("GET", remarksPath()), routeParams({ id: notebookId }))).status).toBe(403);
  });

  it("answers 404 for a remark that does not exist and 400 for an unknown action", async () => {
    signInAs(author);
    expect((await patch("00000000-0000-4000-8000-000000000000", { action: "settle" })).status).toBe(404);
    const { threads } = await list();
    const response = await patch(threads[0].id, { action: "delete" });
    expect(response.status).toBe(400);
    expect((await response.json()).error.message).toMatch(/reply .*settle or reopen/);
  });
});
