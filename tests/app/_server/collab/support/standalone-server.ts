// A co-editing server in its own process, for the crash test: the real hub on an on-disk
// PGlite under DATA_DIR, on PORT (loopback only). Prints "ready <port>" once it listens.
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { getDb } from "@/db/client";
import { createCollabHub } from "@/app/_server/collab/hub";
import { resolveAccess } from "@/app/_server/collab/access";
import { notebookJsonCodec } from "@/app/_server/collab/json-codec";

const db = await getDb();
const hub = createCollabHub({
  db,
  codec: notebookJsonCodec(),
  authenticate: async (req) => new URL(req.url ?? "/", "http://localhost").searchParams.get("as"),
  resolveAccess,
  compactEvery: Number(process.env.COMPACT_EVERY || 500),
  log: () => {},
});
const server = createServer((_, res) => res.writeHead(404).end());
server.on("upgrade", (req, socket, head) => hub.handleUpgrade(req, socket, head));
server.listen(Number(process.env.PORT || 0), "127.0.0.1", () => {
  console.log(`ready ${(server.address() as AddressInfo).port}`);
});
