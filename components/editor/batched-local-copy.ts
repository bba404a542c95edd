"use client";

import * as Y from "yjs";
import type { IndexeddbPersistence } from "y-indexeddb";
import { afterNextFrame } from "@/editor/after-frame";
import { QuietTimer } from "@/editor/quiet-timer";

const QUIET_MS = 250;
const MAX_WAIT_MS = 2_000;

/**
 * Writes this browser's copy of the notebook (y-indexeddb) in batches: one IndexedDB
 * transaction when typing pauses, or every two seconds of continuous typing, instead of one per
 * keystroke (about a millisecond each). The batch is written at once when the tab is hidden or
 * closed. Returns the function that undoes it (and writes what is held).
 */
export function batchLocalCopyWrites(local: IndexeddbPersistence, doc: Y.Doc): () => void {
  doc.off("update", local._storeUpdate);
  let held: Uint8Array[] = [];
  let firstHeldAt = 0;
  const write = () => {
    if (!held.length) return;
    const merged = held.length === 1 ? held[0] : Y.mergeUpdates(held);
    held = [];
    local._storeUpdate(merged, null);
  };
  const quiet = new QuietTimer(QUIET_MS, write);
  let overdue = false;
  const onUpdate = (update: Uint8Array, origin: unknown) => {
    if (origin === local) return; // y-indexeddb's own reads
    if (!held.length) firstHeldAt = Date.now();
    held.push(update);
    if (overdue) return;
    if (Date.now() - firstHeldAt >= MAX_WAIT_MS) {
      // Typing has gone on for a while: write, but after this keystroke's frame.
      quiet.cancel();
      overdue = true;
      afterNextFrame(() => {
        overdue = false;
        write();
      });
    } else quiet.poke();
  };
  const onHide = () => {
    if (document.visibilityState === "hidden") write();
  };
  doc.on("update", onUpdate);
  document.addEventListener("visibilitychange", onHide);
  window.addEventListener("pagehide", write);
  return () => {
    quiet.cancel();
    write();
    doc.off("update", onUpdate);
    document.removeEventListener("visibilitychange", onHide);
    window.removeEventListener("pagehide", write);
  };
}
