// Server side: the one process that serves Vierbein. Migrates the database, then serves
// Next on PORT (and, later, the co-authoring websocket on /yjs/ on the same port).
// Run: `node --import tsx --import ./app/_server/server-only-hook.mjs server.ts` (the npm
// scripts dev/start do), with NODE_ENV=production after `next build`.
import { createServer, type IncomingMessage } from "node:http";
import { EventEmitter } from "node:events";
import type { Duplex } from "node:stream";
import next from "next";
import { closeDb, dbKind, getDb, getDbHandle } from "./db/client";
import { authenticateUpgrade, resolveAccess } from "./app/_server/collab/access";
import { COLLAB_PATH_PREFIX, createCollabHub } from "./app/_server/collab/hub";
import { notebookJsonCodec } from "./app/_server/collab/json-codec";
import { ensureLocalSmtpServer, stopLocalSmtpServer, usesExternalSmtp } from "./app/_server/mail";
// [attachments + checkpoints] local S3 fake and automatic checkpoints
import { startLocalObjectStore, type LocalObjectStore } from "./app/_server/storage/local-s3";
import { startAutoCheckpoints } from "./app/_server/checkpoints/auto";

const dev = process.env.NODE_ENV !== "production";
const port = Number(process.env.PORT || 3000);
const hostname = process.env.HOST || "0.0.0.0";
process.env.NEXTAUTH_URL ||= `http://localhost:${port}`;

/** Paths whose websocket upgrades this server answers itself; nothing else may claim them. */
export const YJS_PATH_PREFIX = COLLAB_PATH_PREFIX;

type UpgradeHandler = (req: IncomingMessage, socket: Duplex, head: Buffer) => void;

async function main(): Promise<void> {
  await getDbHandle(); // migrations run here, before the first request
  console.info(`[server] database ready (${dbKind()})`);

  // Mail: without SMTP_URL, the mailroom's SMTP server runs here, in this process (app/_server/mail).
  if (!usesExternalSmtp()) console.info(`[server] mailroom SMTP on ${(await ensureLocalSmtpServer()).url}`);

  // [attachments] Without S3_ENDPOINT, an S3-compatible fake (s3rver) runs in this process, storing under DATA_DIR/objects.
  const objectStore: LocalObjectStore | null = process.env.S3_ENDPOINT ? null : await startLocalObjectStore();
  if (objectStore) console.info(`[server] local file storage (S3 fake) on ${objectStore.config.endpoint}`);
  // [checkpoints] An automatic checkpoint of each notebook edited and then left idle, at most one per AUTO_CHECKPOINT_MINUTES.
  const autoCheckpoints = startAutoCheckpoints({ db: await getDb() });

  // Next attaches its own upgrade listener (hot reload in dev) to the server of the first
  // request it sees. Handing it a stand-in emitter keeps the single upgrade listener below
  // in charge; in dev, upgrades outside /yjs/ are passed on to Next through the stand-in.
  const nextUpgrades = new EventEmitter();
  const app = next({ dev, hostname, port, httpServer: nextUpgrades as never });
  await app.prepare();
  const handle = app.getRequestHandler();

  // Co-authoring: the Yjs websocket claims only YJS_PATH_PREFIX.
  const collab = createCollabHub({ db: await getDb(), codec: notebookJsonCodec(), authenticate: authenticateUpgrade, resolveAccess, register: true });
  const yjsUpgrade: UpgradeHandler = (req, socket, head) => collab.handleUpgrade(req, socket, head);

  const trustProxy = process.env.TRUST_PROXY === "1";
  const server = createServer((req, res) => {
    // The rate limits key on the client address; without a trusted proxy in front, the
    // header a client sends is replaced by the socket's own address.
    if (!trustProxy) req.headers["x-forwarded-for"] = req.socket.remoteAddress ?? "unknown";
    handle(req, res).catch((error: unknown) => {
      console.error("[server] request failed", error);
      if (!res.headersSent) res.statusCode = 500;
      res.end();
    });
  });

  server.on("upgrade", (req: IncomingMessage, socket: Duplex, head: Buffer) => {
    const pathname = new URL(req.url ?? "/", "http://localhost").pathname;
    if (pathname.startsWith(YJS_PATH_PREFIX)) {
      track(socket);
      return yjsUpgrade(req, socket, head);
    }
    // Dev: hot reload's socket. Production serves no other websockets.
    if (dev && nextUpgrades.listenerCount("upgrade") > 0) {
      track(socket);
      nextUpgrades.emit("upgrade", req, socket, head);
      return;
    }
    socket.destroy();
  });

  server.listen(port, hostname, () => {
    console.info(`[server] Vierbein ${dev ? "development" : "production"} on http://localhost:${port}`);
  });

  // Upgraded sockets no longer count as requests: close() would wait for them for ever.
  const upgraded = new Set<Duplex>();
  const track = (socket: Duplex) => {
    upgraded.add(socket);
    socket.once("close", () => upgraded.delete(socket));
  };

  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    console.info(`[server] ${signal}: closing`);
    const forceExit = setTimeout(() => {
      console.error("[server] connections did not close in time; exiting");
      process.exit(1);
    }, 10_000);
    forceExit.unref();
    server.close(async () => {
      try {
        await app.close();
        await stopLocalSmtpServer(); // mail
        autoCheckpoints.stop(); // [checkpoints]
        await objectStore?.close(); // [attachments]
        await closeDb();
        console.info("[server] closed cleanly");
        process.exit(0);
      } catch (error) {
        console.error("[server] error while closing", error);
        process.exit(1);
      }
    });
  };
  const closeSockets = async () => {
    await collab.close(); // tells co-authors, stores what is pending before the database closes
    for (const socket of upgraded) socket.destroy();
    // Idle keep-alive connections would hold close() open; in-flight requests still finish.
    server.closeIdleConnections();
  };
  const startShutdown = (signal: string) => {
    if (closing) return;
    void closeSockets().finally(() => shutdown(signal));
  };
  process.on("SIGTERM", () => startShutdown("SIGTERM"));
  process.on("SIGINT", () => startShutdown("SIGINT"));
}

main().catch((error: unknown) => {
  console.error("[server] failed to start", error);
  process.exit(1);
});
