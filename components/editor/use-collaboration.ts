"use client";

import { useEffect, useState } from "react";
import { ObservableV2 } from "lib0/observable";
import * as Y from "yjs";
import { WebsocketProvider } from "y-websocket";
import { IndexeddbPersistence } from "y-indexeddb";
import { QuietTimer } from "@/editor/quiet-timer";
import { StoredStateTracker } from "@/editor/stored-state";
import { batchLocalCopyWrites } from "./batched-local-copy";
import { sendEditsAfterFrame } from "./send-after-frame";
import type { CoAuthor } from "@/editor/collaboration";

/** What the page says about the link to the server, in plain words. */
export type LinkState = { kind: "connecting" } | { kind: "online" } | { kind: "offline" } | { kind: "refused"; message: string };

/**
 * Whether everything typed here is stored. It flips with every burst of typing, so it is not
 * React state: a React commit with the caret in a long notebook costs more than a keystroke
 * (React measures the selection across the whole editable text around each commit), and the
 * line that shows it (`LinkIndicator`) writes its words itself.
 */
export class StoredFlag extends ObservableV2<{ change: (allStored: boolean) => void }> {
  private value = true;

  get allStored(): boolean {
    return this.value;
  }

  set(allStored: boolean): void {
    if (allStored === this.value) return;
    this.value = allStored;
    this.emit("change", [allStored]);
  }
}

export interface Collaboration {
  readonly doc: Y.Doc;
  readonly provider: WebsocketProvider;
  /** True once the server's copy (or, offline, this browser's copy) has been loaded. */
  readonly loaded: boolean;
  readonly link: LinkState;
  readonly stored: StoredFlag;
  readonly coAuthors: readonly (CoAuthor & { clientId: number })[];
}

const IDLE_AFTER_MS = 60_000;
/** "Everything is stored" is shown only once local edits have paused this long (see publish). */
const STORED_AFTER_QUIET_MS = 400;

/**
 * Opens a notebook's shared document: the websocket to our server (same origin, the
 * session cookie authenticates it), a copy in IndexedDB so a tab that loses the link keeps
 * its edits and merges them on return, presence with idle/away, and the stored state.
 */
export function useCollaboration(notebookId: string, me: CoAuthor): Collaboration | null {
  const [session, setSession] = useState<Collaboration | null>(null);

  useEffect(() => {
    const doc = new Y.Doc();
    const local = new IndexeddbPersistence(`vierbein-notebook-${notebookId}`, doc);
    const stopBatchingLocalCopy = batchLocalCopyWrites(local, doc);
    const scheme = window.location.protocol === "https:" ? "wss" : "ws";
    const provider = new WebsocketProvider(`${scheme}://${window.location.host}/yjs`, notebookId, doc, { maxBackoffTime: 5_000 });
    const stopDeferringSends = sendEditsAfterFrame(provider, doc);
    const tracker = new StoredStateTracker(doc);
    const stored = new StoredFlag();
    let loaded = false;
    let refused: string | null = null;
    let lastInput = Date.now();
    let lastSignature = "";

    // While the author types, the server acknowledges each keystroke within milliseconds, so the
    // stored state would flicker between its two phrases on every key. Say "storing" until
    // local edits pause, then look again.
    const editsSettle = new QuietTimer(STORED_AFTER_QUIET_MS, () => publish());

    const publish = () => {
      stored.set(tracker.unstoredCount() === 0 && !editsSettle.waiting);
      const link: LinkState = refused
        ? { kind: "refused", message: refused }
        : provider.wsconnected && provider.synced
          ? { kind: "online" }
          : loaded
            ? { kind: "offline" }
            : { kind: "connecting" };
      const coAuthors = [...provider.awareness.getStates().entries()]
        .filter(([clientId, state]) => clientId !== doc.clientID && state.user)
        .map(([clientId, state]) => ({ clientId, ...(state.user as CoAuthor) }));
      // Awareness changes with every caret move; re-render only when what we show changed.
      const signature = JSON.stringify([loaded, link, coAuthors]);
      if (signature === lastSignature) return;
      lastSignature = signature;
      setSession({ doc, provider, loaded, link, stored, coAuthors });
    };
    // Document updates and the server's acknowledgements only move the unstored count: look at
    // them at most every 200 ms (publish also compares presence, which is not free per keystroke).
    let updateTimer: ReturnType<typeof setTimeout> | null = null;
    const publishSoon = () => {
      updateTimer ??= setTimeout(() => {
        updateTimer = null;
        publish();
      }, 200);
    };

    const setStatus = (status: CoAuthor["status"]) => {
      const current = provider.awareness.getLocalState()?.user as CoAuthor | undefined;
      if (current?.status !== status) provider.awareness.setLocalStateField("user", { ...me, status });
    };
    provider.awareness.setLocalStateField("user", { ...me, status: "active" });

    const onServerMessage = (event: MessageEvent) => {
      if (event.data instanceof ArrayBuffer) tracker.noteServerMessage(new Uint8Array(event.data));
      publishSoon();
    };
    const onStatus = () => {
      provider.ws?.removeEventListener("message", onServerMessage);
      provider.ws?.addEventListener("message", onServerMessage);
      publish();
    };
    const onClose = (event: CloseEvent | null) => {
      // 4403: the server says this account may no longer open the notebook.
      if (event?.code === 4403) {
        refused = "Your role in this group changed; this notebook is no longer open to you.";
        provider.shouldConnect = false;
      }
      publish();
    };
    const onSync = (synced: boolean) => {
      if (synced) loaded = true;
      publish();
    };
    local.once("synced", () => {
      loaded = true;
      publish();
    });
    provider.on("status", onStatus);
    provider.on("sync", onSync);
    provider.on("connection-close", onClose);
    provider.awareness.on("change", publish);
    const onDocUpdate = (_update: Uint8Array, origin: unknown) => {
      if (origin !== provider && origin !== local) editsSettle.poke();
      publishSoon();
    };
    doc.on("update", onDocUpdate);

    const onInput = () => {
      lastInput = Date.now();
      setStatus(document.visibilityState === "hidden" ? "away" : "active");
    };
    const onVisibility = () => setStatus(document.visibilityState === "hidden" ? "away" : Date.now() - lastInput > IDLE_AFTER_MS ? "idle" : "active");
    const idleTimer = window.setInterval(onVisibility, 15_000);
    window.addEventListener("keydown", onInput);
    window.addEventListener("pointerdown", onInput);
    document.addEventListener("visibilitychange", onVisibility);
    publish();

    return () => {
      window.clearInterval(idleTimer);
      if (updateTimer !== null) clearTimeout(updateTimer);
      editsSettle.cancel();
      window.removeEventListener("keydown", onInput);
      window.removeEventListener("pointerdown", onInput);
      document.removeEventListener("visibilitychange", onVisibility);
      provider.ws?.removeEventListener("message", onServerMessage);
      stopDeferringSends();
      provider.destroy();
      stopBatchingLocalCopy();
      void local.destroy();
      stored.destroy();
      doc.destroy();
      setSession(null);
    };
    // The user's name and colour are fixed for the page's life; a new notebook id reopens.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [notebookId]);

  return session;
}
