// POST /api/notebooks/:id/review-requests: an author asks a reviewer of the group, who is mailed.
import { closeDb, getDb, jsonRequest, makeUser, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CurrentUser } from "@/app/_server/auth";
import { stopLocalSmtpServer } from "@/app/_server/mail";
import { GET as listReviewers, POST as requestReview } from "@/app/api/notebooks/[id]/review-requests/route";
import { createGroupWithLead } from "@/db/queries/groups";
import { listMailMessages } from "@/db/queries/mail";
import { addMember } from "@/db/queries/members";
import { createNotebook } from "@/db/queries/notebooks";

let lead: CurrentUser, author: CurrentUser, reviewer: CurrentUser, reader: CurrentUser;
let notebookId: string;

beforeAll(async () => {
  const db = await getDb();
  [lead, author, reviewer, reader] = await Promise.all(["lead", "author", "reviewer", "reader"].map(makeUser));
  const groupId = (await createGroupWithLead({ db, name: "Review group", leadUserId: lead.id })).id;
  await addMember({ db, groupId, userId: author.id, role: "author" });
  await addMember({ db, groupId, userId: reviewer.id, role: "reviewer" });
  await addMember({ db, groupId, userId: reader.id, role: "reader" });
  notebookId = (await createNotebook({ db, groupId, title: "Light bending near a toy star", createdBy: author.id })).id;
}, 120_000);
afterAll(async () => {
  await stopLocalSmtpServer();
  await closeDb();
});

const path = () => `/api/notebooks/${notebookId}/review-requests`;
const post = (body: unknown) => requestReview(jsonRequest("POST", path(), body), routeParams({ id: notebookId }));

describe("review requests", () => {
  it("lists the group's reviewers and mails the chosen one, with the author's message and the notebook's link", async () => {
    signInAs(author);
    const { reviewers } = await (await listReviewers(jsonRequest("GET", path()), routeParams({ id: notebookId }))).json();
    expect(reviewers).toEqual([{ userId: reviewer.id, name: reviewer.name, email: reviewer.email }]);

    const response = await post({ reviewerId: reviewer.id, message: "Mainly steps 3 to 5, please." });
    expect(response.status).toBe(201);
    const mails = await listMailMessages({ db: await getDb(), to: reviewer.email });
    expect(mails).toHaveLength(1);
    expect(mails[0]).toMatchObject({ kind: "review-request", to: [reviewer.email], subject: "Review requested: Light bending near a toy star" });
    expect(mails[0].text).toContain("Mainly steps 3 to 5, please.");
    expect(mails[0].text).toContain(`/notebooks/${notebookId}`);
    expect(await listMailMessages({ db: await getDb(), to: author.email })).toHaveLength(0);
  });

  it("only goes to reviewers, and only authors and leads may ask", async () => {
    signInAs(author);
    const notReviewer = await post({ reviewerId: reader.id });
    expect(notReviewer.status).toBe(400);
    expect((await notReviewer.json()).error.code).toBe("bad_request:reviewer");
    for (const who of [reviewer, reader]) {
      signInAs(who);
      expect((await post({ reviewerId: reviewer.id })).status).toBe(403);
    }
    signInAs(lead);
    expect((await post({ reviewerId: reviewer.id })).status).toBe(201);
  });
});
