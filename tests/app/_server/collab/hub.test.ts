import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import WebSocket from "ws";
import * as Y from "yjs";
import { openDatabase, type DbHandle } from "@/db/client";
import { memberships, notebookUpdates, notebooks } from "@/db/schema";
import { announceMembershipChange } from "@/app/_server/collab/membership-events";
import { connectClient, createFixture, startCollabServer, synced, waitFor, type Fixture, type TestServer } from "./harness";

let handle: DbHandle;
let server: TestServer;
let fixture: Fixture;
const open: { provider: { destroy(): void } }[] = [];

beforeAll(async () => {
  handle = await openDatabase({ kind: "pglite", dataDir: "memory://" });
  server = await startCollabServer(handle.db, { compactEvery: 50, compactAfterIdleMs: 100_000 });
});
afterAll(async () => {
  await server?.close();
  await handle?.close();
});
afterEach(() => {
  open.splice(0).forEach((c) => c.provider.destroy());
});

function client(userId: string) {
  const c = connectClient(server, fixture.notebookId, userId);
  open.push(c);
  return c;
}

/** A small deterministic pseudo-random source, so a failing run can be replayed. */
function random(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (s * 1664525 + 1013904223) >>> 0) / 2 ** 32);
}

describe("co-editing hub", () => {
  beforeAll(async () => {
    fixture = await createFixture(handle.db);
  });

  it("lets two authors edit at once and converge", async () => {
    const a = client(fixture.users.author);
    const b = client(fixture.users.coauthor);
    await Promise.all([synced(a.provider), synced(b.provider)]);
    a.doc.getText("t").insert(0, "Schwarzschild ");
    b.doc.getText("t").insert(0, "orbits ");
    await waitFor(() => a.doc.getText("t").toString() === b.doc.getText("t").toString() && a.doc.getText("t").length === 21);
    expect(a.doc.getText("t").toString()).toBe(b.doc.getText("t").toString());
  });

  it("converges with ten clients making random edits and dropping their connections", async () => {
    const rnd = random(7);
    const writers = [fixture.users.lead, fixture.users.author, fixture.users.coauthor];
    const clients = Array.from({ length: 10 }, (_, i) => client(writers[i % writers.length]));
    await Promise.all(clients.map((c) => synced(c.provider)));
    for (let round = 0; round < 30; round++) {
      const c = clients[Math.floor(rnd() * clients.length)];
      const text = c.doc.getText("ten");
      if (rnd() < 0.7 || text.length === 0) text.insert(Math.floor(rnd() * (text.length + 1)), String.fromCharCode(97 + Math.floor(rnd() * 26)));
      else text.delete(Math.floor(rnd() * text.length), 1);
      if (rnd() < 0.15) {
        c.provider.disconnect();
        c.doc.getText("ten").insert(0, "x"); // edited while offline
        setTimeout(() => c.provider.connect(), Math.floor(rnd() * 50));
      }
      await new Promise((r) => setTimeout(r, Math.floor(rnd() * 5)));
    }
    await waitFor(() => clients.every((c) => c.provider.wsconnected && c.provider.synced));
    await waitFor(() => new Set(clients.map((c) => c.doc.getText("ten").toString())).size === 1, 15_000, "ten clients to agree");
    const reference = clients[0].doc.getText("ten").toString();
    expect(reference.length).toBeGreaterThan(0);
    clients.forEach((c) => expect(c.doc.getText("ten").toString()).toBe(reference));
  });

  it("drops a reader's and a reviewer's writes on the server and never stores them", async () => {
    const author = client(fixture.users.author);
    const reader = client(fixture.users.reader);
    const reviewer = client(fixture.users.reviewer);
    await Promise.all([synced(author.provider), synced(reader.provider), synced(reviewer.provider)]);
    await server.hub.rooms.get(fixture.notebookId)!.flush();
    const before = await handle.db.select().from(notebookUpdates).where(eq(notebookUpdates.notebookId, fixture.notebookId));
    reader.doc.getText("ro").insert(0, "reader was here");
    reviewer.doc.getText("ro").insert(0, "reviewer was here");
    author.doc.getText("ro2").insert(0, "author marker");
    await waitFor(() => reader.doc.getText("ro2").toString() === "author marker");
    await server.hub.rooms.get(fixture.notebookId)!.flush();
    expect(author.doc.getText("ro").toString()).toBe("");
    expect(server.hub.rooms.get(fixture.notebookId)!.doc.getText("ro").toString()).toBe("");
    const after = await handle.db.select().from(notebookUpdates).where(eq(notebookUpdates.notebookId, fixture.notebookId));
    const stored = new Y.Doc();
    const [row] = await handle.db.select().from(notebooks).where(eq(notebooks.id, fixture.notebookId));
    if (row.ydoc) Y.applyUpdate(stored, row.ydoc);
    after.forEach((u) => Y.applyUpdate(stored, u.data));
    expect(stored.getText("ro").toString()).toBe("");
    expect(stored.getText("ro2").toString()).toBe("author marker");
    expect(after.length).toBeGreaterThanOrEqual(before.length);
  });

  it("refuses a non-member, a signed-out visitor and an unknown notebook", async () => {
    const status = (path: string) =>
      new Promise<number>((resolve) => {
        const ws = new WebSocket(`${server.url}/${path}`);
        ws.on("unexpected-response", (_, res) => resolve(res.statusCode ?? 0));
        ws.on("open", () => resolve(101));
        ws.on("error", () => {});
      });
    expect(await status(`${fixture.notebookId}?as=${fixture.users.outsider}`)).toBe(403);
    expect(await status(`${fixture.notebookId}`)).toBe(401);
    expect(await status(`00000000-0000-4000-8000-000000000000?as=${fixture.users.author}`)).toBe(404);
    expect(await status(`not-a-notebook?as=${fixture.users.author}`)).toBe(404);
  });

  it("applies a role change to an open connection at once", async () => {
    const coauthor = client(fixture.users.coauthor);
    const lead = client(fixture.users.lead);
    await Promise.all([synced(coauthor.provider), synced(lead.provider)]);
    await handle.db.update(memberships).set({ role: "reader" }).where(eq(memberships.userId, fixture.users.coauthor));
    announceMembershipChange({ groupId: fixture.groupId, userId: fixture.users.coauthor });
    await waitFor(() => [...server.hub.rooms.get(fixture.notebookId)!.peers].some((p) => p.userId === fixture.users.coauthor && p.access === "read"));
    coauthor.doc.getText("demoted").insert(0, "should not land");
    lead.doc.getText("demoted-marker").insert(0, "lead");
    await waitFor(() => coauthor.doc.getText("demoted-marker").toString() === "lead");
    await server.hub.rooms.get(fixture.notebookId)!.flush();
    expect(lead.doc.getText("demoted").toString()).toBe("");
    await handle.db.update(memberships).set({ role: "author" }).where(eq(memberships.userId, fixture.users.coauthor));
    announceMembershipChange({ groupId: fixture.groupId, userId: fixture.users.coauthor });
  });

  it("rebuilds the document from the store after the room closes, compacted", async () => {
    const a = client(fixture.users.author);
    await synced(a.provider);
    for (let i = 0; i < 120; i++) a.doc.getText("many").insert(i, "z");
    await waitFor(() => server.hub.rooms.get(fixture.notebookId)?.doc.getText("many").length === 120);
    const expected = a.doc.getText("t").toString();
    open.splice(0).forEach((c) => c.provider.destroy());
    await waitFor(() => !server.hub.rooms.has(fixture.notebookId), 10_000, "the room to close");
    const pending = await handle.db.select().from(notebookUpdates).where(eq(notebookUpdates.notebookId, fixture.notebookId));
    expect(pending.length).toBe(0); // everything merged into the snapshot on close
    const b = client(fixture.users.reader);
    await synced(b.provider);
    expect(b.doc.getText("many").length).toBe(120);
    expect(b.doc.getText("t").toString()).toBe(expected);
  });

  it("closes a socket that sends garbage and keeps serving the others", async () => {
    const a = client(fixture.users.author);
    await synced(a.provider);
    const closed = await new Promise<number>((resolve) => {
      const ws = new WebSocket(`${server.url}/${fixture.notebookId}?as=${fixture.users.author}`);
      ws.on("open", () => ws.send(Buffer.from([0, 2, 200, 1, 2, 3])));
      ws.on("close", (code) => resolve(code));
    });
    expect(closed).toBe(4400);
    a.doc.getText("after-garbage").insert(0, "still fine");
    await waitFor(() => server.hub.rooms.get(fixture.notebookId)?.doc.getText("after-garbage").toString() === "still fine");
  });
});
