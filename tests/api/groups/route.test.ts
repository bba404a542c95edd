// /api/groups, /api/groups/:id and its members through their route handlers.
import { closeDb, getDb, jsonRequest, lastAuditEntry, makeUser, noParams, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CurrentUser } from "@/app/_server/auth";
import { GET as listGroups, POST as createGroup } from "@/app/api/groups/route";
import { GET as getGroup } from "@/app/api/groups/[id]/route";
import { GET as listMembersRoute, POST as addMemberRoute } from "@/app/api/groups/[id]/members/route";
import { DELETE as removeMemberRoute, PATCH as changeRoleRoute } from "@/app/api/groups/[id]/members/[userId]/route";
import { GET as me } from "@/app/api/me/route";
import { listMembers } from "@/db/queries/members";

let founder: CurrentUser, colleague: CurrentUser, stranger: CurrentUser;
let groupId: string;

beforeAll(async () => {
  await getDb();
  [founder, colleague, stranger] = await Promise.all(["founder", "colleague", "stranger"].map(makeUser));
}, 120_000);
afterAll(() => closeDb());

const membersPath = () => `/api/groups/${groupId}/members`;

describe("groups", () => {
  it("POST makes the creator the lead, and GET lists it with their role", async () => {
    signInAs(founder);
    const created = await createGroup(jsonRequest("POST", "/api/groups", { name: "Frame-dragging club", description: "Kerr, mostly." }), noParams);
    expect(created.status).toBe(201);
    const { group } = await created.json();
    groupId = group.id;
    expect(group).toMatchObject({ name: "Frame-dragging club", role: "lead", memberCount: 1 });
    const { groups } = await (await listGroups(jsonRequest("GET", "/api/groups"), noParams)).json();
    expect(groups).toEqual([expect.objectContaining({ id: groupId, role: "lead", memberCount: 1 })]);
    const mine = await (await me(jsonRequest("GET", "/api/me"), noParams)).json();
    expect(mine.user).toEqual(founder);
    expect(mine.groups[0].id).toBe(groupId);
  });

  it("POST refuses a nameless or overlong group", async () => {
    signInAs(founder);
    expect((await createGroup(jsonRequest("POST", "/api/groups", { name: "" }), noParams)).status).toBe(400);
    expect((await createGroup(jsonRequest("POST", "/api/groups", { name: "n".repeat(121) }), noParams)).status).toBe(400);
  });

  it("GET /api/groups/:id is for members only", async () => {
    signInAs(founder);
    const response = await getGroup(jsonRequest("GET", `/api/groups/${groupId}`), routeParams({ id: groupId }));
    expect((await response.json()).permissions).toEqual({ manageMembers: true, createNotebook: true });
    signInAs(stranger);
    expect((await getGroup(jsonRequest("GET", `/api/groups/${groupId}`), routeParams({ id: groupId }))).status).toBe(403);
  });
});

describe("members", () => {
  it("the lead adds an existing account with a role; twice is a conflict; an unknown address is 404", async () => {
    signInAs(founder);
    const added = await addMemberRoute(jsonRequest("POST", membersPath(), { email: colleague.email.toUpperCase(), role: "reviewer" }), routeParams({ id: groupId }));
    expect(added.status).toBe(201);
    expect((await added.json()).member).toMatchObject({ userId: colleague.id, role: "reviewer" });
    expect((await addMemberRoute(jsonRequest("POST", membersPath(), { email: colleague.email, role: "author" }), routeParams({ id: groupId }))).status).toBe(409);
    expect((await addMemberRoute(jsonRequest("POST", membersPath(), { email: "nobody@example.test", role: "author" }), routeParams({ id: groupId }))).status).toBe(404);
    expect((await addMemberRoute(jsonRequest("POST", membersPath(), { email: stranger.email, role: "owner" }), routeParams({ id: groupId }))).status).toBe(400);
    const { members } = await (await listMembersRoute(jsonRequest("GET", membersPath()), routeParams({ id: groupId }))).json();
    expect(members.map((m: { userId: string; role: string }) => [m.userId, m.role]).sort()).toEqual([[colleague.id, "reviewer"], [founder.id, "lead"]].sort());
  });

  it("a non-lead cannot add, promote or remove anyone, and the attempt is logged", async () => {
    signInAs(colleague);
    expect((await addMemberRoute(jsonRequest("POST", membersPath(), { email: stranger.email, role: "author" }), routeParams({ id: groupId }))).status).toBe(403);
    const promote = await changeRoleRoute(jsonRequest("PATCH", `${membersPath()}/${colleague.id}`, { role: "lead" }), routeParams({ id: groupId, userId: colleague.id }));
    expect(promote.status).toBe(403);
    expect(await lastAuditEntry()).toMatchObject({ actorId: colleague.id, action: "group:manage-members", outcome: "denied" });
    expect((await removeMemberRoute(jsonRequest("DELETE", `${membersPath()}/${founder.id}`), routeParams({ id: groupId, userId: founder.id }))).status).toBe(403);
    const roles = (await listMembers({ db: await getDb(), groupId })).map((m) => m.role).sort();
    expect(roles).toEqual(["lead", "reviewer"]);
  });

  it("the last lead cannot step down or be removed (409), but can once another lead exists", async () => {
    signInAs(founder);
    const stepDown = await changeRoleRoute(jsonRequest("PATCH", `${membersPath()}/${founder.id}`, { role: "author" }), routeParams({ id: groupId, userId: founder.id }));
    expect(stepDown.status).toBe(409);
    expect((await stepDown.json()).error.code).toBe("conflict:last-lead");
    expect((await removeMemberRoute(jsonRequest("DELETE", `${membersPath()}/${founder.id}`), routeParams({ id: groupId, userId: founder.id }))).status).toBe(409);

    const promoted = await changeRoleRoute(jsonRequest("PATCH", `${membersPath()}/${colleague.id}`, { role: "lead" }), routeParams({ id: groupId, userId: colleague.id }));
    expect((await promoted.json()).member).toMatchObject({ userId: colleague.id, role: "lead" });
    const removed = await removeMemberRoute(jsonRequest("DELETE", `${membersPath()}/${founder.id}`), routeParams({ id: groupId, userId: founder.id }));
    expect(removed.status).toBe(200);
    expect((await listMembers({ db: await getDb(), groupId })).map((m) => m.userId)).toEqual([colleague.id]);
  });

  it("unknown members and malformed ids get a clear 4xx", async () => {
    signInAs(colleague);
    expect((await changeRoleRoute(jsonRequest("PATCH", `${membersPath()}/${stranger.id}`, { role: "reader" }), routeParams({ id: groupId, userId: stranger.id }))).status).toBe(404);
    expect((await changeRoleRoute(jsonRequest("PATCH", `${membersPath()}/x`, { role: "reader" }), routeParams({ id: groupId, userId: "x" }))).status).toBe(400);
    const missingGroup = "8a1f2c3d-0000-4000-8000-00000000beef";
    expect((await listMembersRoute(jsonRequest("GET", `/api/groups/${missingGroup}/members`), routeParams({ id: missingGroup }))).status).toBe(404);
  });
});
