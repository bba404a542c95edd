import "server-only";
import * as Y from "yjs";
import * as awarenessProtocol from "y-protocols/awareness";
import type { Db } from "@/db/client";
import { appendNotebookUpdates, compactNotebookDocument, getStoredNotebookDocument } from "@/db/queries/notebook-updates";
import { decodeClientMessage, encodeAwareness, encodeSyncStep1, encodeSyncStep2, encodeUpdate } from "./protocol";
import type { JsonDocumentCodec } from "./json-codec";

export type Access = "write" | "read";

/** One open socket in a room, as the room sees it. */
export interface Peer {
  readonly userId: string;
  access: Access;
  send(message: Uint8Array): void;
  close(code: number, reason: string): void;
}

export interface RoomOptions {
  readonly db: Db;
  readonly notebookId: string;
  readonly codec: JsonDocumentCodec;
  /** Compact after this many stored updates (also on idle and when the room empties). */
  readonly compactEvery?: number;
  readonly compactAfterIdleMs?: number;
  readonly log?: (message: string, error?: unknown) => void;
}

/**
 * A notebook's live co-editing session: one Y.Doc and its awareness, shared by every
 * socket open on the notebook. Writers' updates are validated, stored, and only then
 * applied and broadcast, so anything a peer has seen is already durable. Read-only peers
 * (reviewers, readers) receive the document but their updates are dropped here, on the
 * server, whatever their client does.
 */
export class NotebookRoom {
  readonly doc = new Y.Doc({ gc: true });
  readonly awareness = new awarenessProtocol.Awareness(this.doc);
  readonly peers = new Set<Peer>();
  groupId = "";
  /** Sockets past authentication that have not joined yet; the room stays open for them. */
  expecting = 0;
  private readonly peerClients = new Map<Peer, Set<number>>();
  /** Serialises every store write so updates are stored in the order they are applied. */
  private writes: Promise<unknown> = Promise.resolve();
  private lastStoredId = 0;
  private compactedThrough = 0;
  private idleTimer: NodeJS.Timeout | undefined;
  /** Updates received but not yet stored; stored together in one write (group commit). */
  private pending: { update: Uint8Array; userId: string | null; peer: Peer | null }[] = [];
  private keepStoredJson = false;
  readonly ready: Promise<void>;

  constructor(private readonly options: RoomOptions) {
    this.awareness.setLocalState(null); // the server has no presence of its own
    this.doc.on("update", (update: Uint8Array) => this.broadcast(encodeUpdate(update)));
    this.awareness.on("update", ({ added, updated, removed }: AwarenessChange, origin: unknown) => {
      const changed = [...added, ...updated, ...removed];
      if (origin && this.peerClients.has(origin as Peer)) {
        const owned = this.peerClients.get(origin as Peer)!;
        added.forEach((id) => owned.add(id));
        removed.forEach((id) => owned.delete(id));
      }
      this.broadcast(encodeAwareness(awarenessProtocol.encodeAwarenessUpdate(this.awareness, changed)));
    });
    this.ready = this.load();
  }

  private async load(): Promise<void> {
    const { db, notebookId } = this.options;
    const stored = await getStoredNotebookDocument({ db, notebookId });
    if (!stored) throw new Error(`notebook ${notebookId} does not exist`);
    this.groupId = stored.groupId;
    Y.transact(this.doc, () => {
      if (stored.snapshot) Y.applyUpdate(this.doc, stored.snapshot, "store");
      for (const { data } of stored.updates) Y.applyUpdate(this.doc, data, "store");
    }, "store");
    this.compactedThrough = stored.compactedThrough;
    this.lastStoredId = stored.updates.at(-1)?.id ?? stored.compactedThrough;
    // A notebook that was only ever saved as JSON (demo data) moves into co-editing once.
    if (!stored.snapshot && stored.updates.length === 0 && stored.content) {
      try {
        this.options.codec.writeJson(this.doc, stored.content);
        await this.compact();
      } catch (error) {
        // Stored JSON the schema cannot read stays as it is: never written over from here.
        this.keepStoredJson = true;
        this.options.log?.(`[collab] stored JSON of ${this.options.notebookId} does not fit the schema`, error);
      }
    }
  }

  /** Adds a socket: sends it our state vector and the document, and the others' presence. */
  join(peer: Peer): void {
    this.peers.add(peer);
    this.peerClients.set(peer, new Set());
    peer.send(encodeSyncStep1(Y.encodeStateVector(this.doc)));
    const states = [...this.awareness.getStates().keys()];
    if (states.length) peer.send(encodeAwareness(awarenessProtocol.encodeAwarenessUpdate(this.awareness, states)));
  }

  /** Removes a socket and its presence. Resolves when the room may be dropped (stored and compacted). */
  async leave(peer: Peer): Promise<boolean> {
    const clients = this.peerClients.get(peer);
    this.peers.delete(peer);
    this.peerClients.delete(peer);
    if (clients?.size) awarenessProtocol.removeAwarenessStates(this.awareness, [...clients], null);
    if (this.peers.size > 0) return false;
    await this.enqueue(() => this.compactIfDirty());
    return this.peers.size === 0;
  }

  /** Stores and compacts what a room opened without sockets (a server-side edit) changed. */
  async leaveEmpty(): Promise<void> {
    await this.enqueue(() => this.compactIfDirty());
  }

  /** Handles one binary message from a peer. Malformed messages throw; the caller closes that socket. */
  async receive(peer: Peer, data: Uint8Array): Promise<void> {
    const message = decodeClientMessage(data);
    switch (message.type) {
      case "sync-step-1":
        peer.send(encodeSyncStep2(Y.encodeStateAsUpdate(this.doc, message.stateVector)));
        return;
      case "update":
        if (peer.access !== "write") return; // read-only: refused here, not just hidden in the UI
        // Refuse bytes that are not a Yjs update before they reach the log.
        Y.decodeUpdate(message.update);
        this.pending.push({ update: message.update, userId: peer.userId, peer });
        if (this.pending.length === 1) void this.enqueue(() => this.storePending());
        return;
      case "awareness":
        awarenessProtocol.applyAwarenessUpdate(this.awareness, message.update, peer);
        return;
      case "query-awareness":
        peer.send(encodeAwareness(awarenessProtocol.encodeAwarenessUpdate(this.awareness, [...this.awareness.getStates().keys()])));
        return;
    }
  }

  /**
   * The stored state as one update, after whatever is pending has been stored. Code outside
   * the co-editing server (route handlers run in Next's bundle, with their own copy of Yjs)
   * must only exchange bytes with a room: Yjs types from two copies do not mix.
   */
  async currentState(): Promise<Uint8Array> {
    await this.ready;
    await this.flush();
    return Y.encodeStateAsUpdate(this.doc);
  }

  /**
   * Stores a change made on the server (a checkpoint restore, computed on a copy of
   * {@link currentState}) like any writer's update, then applies and broadcasts it.
   */
  async applyServerUpdate(update: Uint8Array, userId: string | null): Promise<void> {
    await this.ready;
    await this.enqueue(async () => {
      this.pending.push({ update, userId, peer: null });
      await this.storePending();
    });
  }

  /** Stores every pending update in one statement, then applies and broadcasts them. */
  private async storePending(): Promise<void> {
    const batch = this.pending;
    this.pending = [];
    if (batch.length === 0) return;
    try {
      this.lastStoredId = await appendNotebookUpdates({
        db: this.options.db,
        notebookId: this.options.notebookId,
        updates: batch.map(({ update, userId }) => ({ data: update, userId })),
      });
    } catch (error) {
      // Nothing of the batch was applied or shown to anyone; the writers reconnect and
      // their sync sends the same changes again.
      for (const peer of new Set(batch.map((b) => b.peer))) peer?.close(1011, "could not store the change; reconnecting");
      throw error;
    }
    for (const { update, peer } of batch) Y.applyUpdate(this.doc, update, peer ?? "server");
    await this.maybeCompact();
  }

  /** Waits until every update received so far is stored. */
  flush(): Promise<void> {
    return this.enqueue(async () => {});
  }

  private enqueue<T>(job: () => Promise<T>): Promise<T> {
    const next = this.writes.then(job);
    this.writes = next.catch((error: unknown) => this.options.log?.(`[collab] store write failed for ${this.options.notebookId}`, error));
    return next;
  }

  private async maybeCompact(): Promise<void> {
    clearTimeout(this.idleTimer);
    if (this.lastStoredId - this.compactedThrough >= (this.options.compactEvery ?? 500)) {
      await this.compact();
      return;
    }
    this.idleTimer = setTimeout(() => void this.enqueue(() => this.compactIfDirty()), this.options.compactAfterIdleMs ?? 5_000);
    this.idleTimer.unref();
  }

  private async compactIfDirty(): Promise<void> {
    clearTimeout(this.idleTimer);
    if (this.lastStoredId > this.compactedThrough) await this.compact();
  }

  /** Merges everything stored so far into one snapshot (runs inside the write queue). */
  private async compact(): Promise<void> {
    const snapshot = Y.encodeStateAsUpdate(this.doc);
    const throughId = this.lastStoredId;
    let content: Record<string, unknown> | null = null;
    try {
      if (!this.keepStoredJson) content = this.options.codec.readJson(this.doc);
    } catch (error) {
      this.options.log?.(`[collab] could not derive JSON for ${this.options.notebookId}`, error);
    }
    await compactNotebookDocument({ db: this.options.db, notebookId: this.options.notebookId, snapshot, throughId, content });
    this.compactedThrough = throughId;
  }

  private broadcast(message: Uint8Array): void {
    for (const peer of this.peers) peer.send(message);
  }

  destroy(): void {
    clearTimeout(this.idleTimer);
    this.awareness.destroy();
    this.doc.destroy();
  }
}

type AwarenessChange = { added: number[]; updated: number[]; removed: number[] };
