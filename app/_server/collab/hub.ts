import "server-only";
import type { IncomingMessage } from "node:http";
import type { Duplex } from "node:stream";
import { WebSocketServer, type WebSocket } from "ws";
import { z } from "zod";
import type { Db } from "@/db/client";
import { onMembershipChange } from "./membership-events";
import { NotebookRoom, type Access, type Peer } from "./room";
import type { JsonDocumentCodec } from "./json-codec";

export const COLLAB_PATH_PREFIX = "/yjs/";
const notebookIdSchema = z.uuid();
/** Close codes in the private range (4000–4999) the client shows as plain words. */
export const CLOSE_FORBIDDEN = 4403;
export const CLOSE_BAD_MESSAGE = 4400;

export interface CollabHubOptions {
  readonly db: Db;
  readonly codec: JsonDocumentCodec;
  /** Who is asking (from the session cookie); null refuses the socket with 401. */
  readonly authenticate: (req: IncomingMessage) => Promise<string | null>;
  readonly resolveAccess: (args: { db: Db; userId: string; groupId: string; notebookId: string }) => Promise<Access | null>;
  readonly compactEvery?: number;
  readonly compactAfterIdleMs?: number;
  /** Largest message accepted from a client, in bytes. */
  readonly maxMessageBytes?: number;
  readonly log?: (message: string, error?: unknown) => void;
  /** Make this the process's hub for {@link registered} (the server does; tests need not). */
  readonly register?: boolean;
}

export interface CollabHub {
  /** Claims upgrades under /yjs/<notebook id>; answers 401/403/404 itself. */
  handleUpgrade(req: IncomingMessage, socket: Duplex, head: Buffer): void;
  /** Stores everything pending, closes every socket. */
  close(): Promise<void>;
  readonly rooms: ReadonlyMap<string, NotebookRoom>;
  /** Runs `job` on the notebook's live room (opened for the job if no one has it open). */
  withRoom<T>(notebookId: string, job: (room: NotebookRoom) => Promise<T>): Promise<T>;
}

/**
 * The co-editing endpoint: the y-websocket protocol (sync + awareness) over `ws`, one
 * {@link NotebookRoom} per open notebook, access decided per socket from the session and
 * re-decided when a membership changes.
 */
export function createCollabHub(options: CollabHubOptions): CollabHub {
  const log = options.log ?? ((message, error) => console.error(message, error ?? ""));
  const wss = new WebSocketServer({ noServer: true, maxPayload: options.maxMessageBytes ?? 8 * 1024 * 1024 });
  const rooms = new Map<string, NotebookRoom>();

  const openRoom = async (notebookId: string): Promise<NotebookRoom | null> => {
    let room = rooms.get(notebookId);
    if (!room) {
      room = new NotebookRoom({ db: options.db, notebookId, codec: options.codec, compactEvery: options.compactEvery, compactAfterIdleMs: options.compactAfterIdleMs, log });
      rooms.set(notebookId, room);
      room.ready.catch(() => rooms.delete(notebookId));
    }
    try {
      await room.ready;
      return room;
    } catch {
      return null;
    }
  };

  const dropIfUnused = (notebookId: string, room: NotebookRoom) => {
    if (rooms.get(notebookId) === room && room.peers.size === 0 && room.expecting <= 1) {
      rooms.delete(notebookId);
      room.destroy();
    }
  };

  const refuse = (socket: Duplex, status: number, text: string) => {
    socket.end(`HTTP/1.1 ${status} ${text}\r\nConnection: close\r\nContent-Length: 0\r\n\r\n`);
  };

  const stopListening = onMembershipChange(({ groupId, userId }) => {
    for (const [notebookId, room] of rooms) {
      if (room.groupId !== groupId) continue;
      for (const peer of room.peers) {
        if (peer.userId !== userId) continue;
        options
          .resolveAccess({ db: options.db, userId, groupId, notebookId })
          .then((access) => {
            if (access) peer.access = access;
            else peer.close(CLOSE_FORBIDDEN, "no longer a member of this group");
          })
          .catch((error: unknown) => log("[collab] could not re-check access", error));
      }
    }
  });

  const attach = (ws: WebSocket, room: NotebookRoom, notebookId: string, userId: string, access: Access) => {
    const peer: Peer = {
      userId,
      access,
      send: (message) => {
        if (ws.readyState === ws.OPEN) ws.send(message, (error) => error && ws.terminate());
      },
      close: (code, reason) => ws.close(code, reason),
    };
    // Messages are handled one at a time per socket so a client's updates keep their order.
    let queue: Promise<void> = Promise.resolve();
    ws.on("message", (data: Buffer, isBinary: boolean) => {
      queue = queue.then(async () => {
        if (!isBinary) throw new Error("text frames are not part of the protocol");
        await room.receive(peer, new Uint8Array(data.buffer, data.byteOffset, data.byteLength));
      }).catch((error: unknown) => {
        log(`[collab] bad message on ${notebookId}`, error);
        ws.close(CLOSE_BAD_MESSAGE, "malformed message");
      });
    });
    ws.on("close", () => {
      void queue.then(async () => {
        if (await room.leave(peer)) {
          if (rooms.get(notebookId) === room && room.peers.size === 0 && room.expecting === 0) {
            rooms.delete(notebookId);
            room.destroy();
          }
        }
      }).catch((error: unknown) => log(`[collab] closing ${notebookId} failed`, error));
    });
    ws.on("error", (error) => log(`[collab] socket error on ${notebookId}`, error));
    room.join(peer);
  };

  const hub: CollabHub = {
    rooms,
    async withRoom(notebookId, job) {
      const room = await openRoom(notebookId);
      if (!room) throw new Error(`notebook ${notebookId} does not exist`);
      room.expecting += 1;
      try {
        return await job(room);
      } finally {
        if (room.peers.size === 0 && room.expecting === 1) {
          await room.leaveEmpty();
          dropIfUnused(notebookId, room);
        }
        room.expecting -= 1;
      }
    },
    handleUpgrade(req, socket, head) {
      const pathname = new URL(req.url ?? "/", "http://localhost").pathname;
      const parsed = notebookIdSchema.safeParse(decodeURIComponent(pathname.slice(COLLAB_PATH_PREFIX.length)));
      if (!pathname.startsWith(COLLAB_PATH_PREFIX) || !parsed.success) return refuse(socket, 404, "Not Found");
      const notebookId = parsed.data;
      socket.on("error", () => socket.destroy());
      void (async () => {
        const userId = await options.authenticate(req);
        if (!userId) return refuse(socket, 401, "Unauthorized");
        const room = await openRoom(notebookId);
        if (!room) return refuse(socket, 404, "Not Found");
        room.expecting += 1;
        try {
          const access = await options.resolveAccess({ db: options.db, userId, groupId: room.groupId, notebookId });
          if (!access) {
            dropIfUnused(notebookId, room);
            return refuse(socket, 403, "Forbidden");
          }
          wss.handleUpgrade(req, socket, head, (ws) => attach(ws, room, notebookId, userId, access));
        } finally {
          room.expecting -= 1;
        }
      })().catch((error: unknown) => {
        log("[collab] upgrade failed", error);
        refuse(socket, 500, "Internal Server Error");
      });
    },
    async close() {
      stopListening();
      for (const client of wss.clients) client.close(1001, "server closing");
      await Promise.all([...rooms.values()].map((room) => room.flush()));
      wss.close();
      if (registered() === hub) (globalThis as Record<symbol, unknown>)[hubKey] = undefined;
    },
  };
  if (options.register) (globalThis as Record<symbol, unknown>)[hubKey] = hub;
  return hub;
}

// The hub lives in server.ts's module graph; route handlers (Next's bundle, same process)
// reach it through globalThis to edit a notebook that people may have open.
const hubKey = Symbol.for("vierbein.collab.hub");

/** The process's co-editing hub, when the server started one. */
export function registered(): CollabHub | undefined {
  return (globalThis as Record<symbol, unknown>)[hubKey] as CollabHub | undefined;
}
