"use client";

import * as Y from "yjs";
import type { WebsocketProvider } from "y-websocket";
import { afterNextFrame } from "@/editor/after-frame";

/**
 * Sends this tab's edits to the server (and to its other tabs) right after the frame that shows
 * them, merged into one message, instead of inside the keystroke: the websocket send was the
 * largest single cost of a keystroke (1–2 ms). Co-authors receive the text at most a frame later
 * (100 ms in a hidden tab). Returns the function that undoes it (and sends what is held).
 */
export function sendEditsAfterFrame(provider: WebsocketProvider, doc: Y.Doc): () => void {
  doc.off("update", provider._updateHandler);
  let held: Uint8Array[] = [];
  const send = () => {
    if (!held.length) return;
    const merged = held.length === 1 ? held[0] : Y.mergeUpdates(held);
    held = [];
    provider._updateHandler(merged, null);
  };
  const onUpdate = (update: Uint8Array, origin: unknown) => {
    if (origin === provider) return; // the server's own updates go nowhere
    held.push(update);
    if (held.length === 1) afterNextFrame(send);
  };
  doc.on("update", onUpdate);
  return () => {
    send();
    doc.off("update", onUpdate);
  };
}
