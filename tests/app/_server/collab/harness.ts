// A co-editing server on a random loopback port for the tests: the real hub and room code,
// the real database (PGlite in memory), and a test-only way to say who is connecting (the
// `as` query parameter) in place of the session cookie, which is tested on its own.
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import WebSocket from "ws";
import * as Y from "yjs";
import { WebsocketProvider } from "y-websocket";
import type { Db } from "@/db/client";
import { groups, memberships, notebooks, users } from "@/db/schema";
import { createCollabHub, type CollabHub } from "@/app/_server/collab/hub";
import { resolveAccess } from "@/app/_server/collab/access";
import { notebookJsonCodec } from "@/app/_server/collab/json-codec";

export interface TestServer {
  url: string;
  hub: CollabHub;
  close(): Promise<void>;
}

export async function startCollabServer(db: Db, options: { compactEvery?: number; compactAfterIdleMs?: number; register?: boolean } = {}): Promise<TestServer> {
  const hub = createCollabHub({
    db,
    codec: notebookJsonCodec(),
    authenticate: async (req) => new URL(req.url ?? "/", "http://localhost").searchParams.get("as"),
    resolveAccess,
    log: () => {},
    ...options,
  });
  const server: Server = createServer((_, res) => res.writeHead(404).end());
  server.on("upgrade", (req, socket, head) => hub.handleUpgrade(req, socket, head));
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `ws://127.0.0.1:${port}/yjs`,
    hub,
    async close() {
      await hub.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

export interface Fixture {
  groupId: string;
  notebookId: string;
  users: Record<"lead" | "author" | "coauthor" | "reviewer" | "reader" | "outsider", string>;
}

export async function createFixture(db: Db): Promise<Fixture> {
  const [group] = await db.insert(groups).values({ name: "Test group" }).returning();
  const names = ["lead", "author", "coauthor", "reviewer", "reader", "outsider"] as const;
  const ids = {} as Fixture["users"];
  for (const name of names) {
    const [user] = await db.insert(users).values({ email: `${name}-${group.id}@example.test`, name }).returning();
    ids[name] = user.id;
  }
  const roleOf = { lead: "lead", author: "author", coauthor: "author", reviewer: "reviewer", reader: "reader" } as const;
  for (const [name, role] of Object.entries(roleOf)) {
    await db.insert(memberships).values({ groupId: group.id, userId: ids[name as keyof typeof roleOf], role });
  }
  const [notebook] = await db.insert(notebooks).values({ groupId: group.id, title: "Shared notebook" }).returning();
  return { groupId: group.id, notebookId: notebook.id, users: ids };
}

/** A y-websocket client (the same provider the browser uses) as a given user. */
export function connectClient(server: TestServer, notebookId: string, userId: string): { doc: Y.Doc; provider: WebsocketProvider } {
  const doc = new Y.Doc();
  const provider = new WebsocketProvider(server.url, notebookId, doc, {
    WebSocketPolyfill: WebSocket as never,
    params: { as: userId },
    disableBc: true,
    maxBackoffTime: 200,
  });
  return { doc, provider };
}

export function waitFor(predicate: () => boolean, timeoutMs = 10_000, what = "condition"): Promise<void> {
  const started = Date.now();
  return new Promise((resolve, reject) => {
    const tick = () => {
      if (predicate()) return resolve();
      if (Date.now() - started > timeoutMs) return reject(new Error(`timed out waiting for ${what}`));
      setTimeout(tick, 10);
    };
    tick();
  });
}

export const synced = (provider: WebsocketProvider) => waitFor(() => provider.synced, 10_000, "sync");
