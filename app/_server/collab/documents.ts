import "server-only";
import * as Y from "yjs";
import type { Db } from "@/db/client";
import { getStoredNotebookDocument } from "@/db/queries/notebook-updates";
import { registered } from "./hub";
import { notebookJsonCodec } from "./json-codec";
import { NotebookRoom } from "./room";

/**
 * The server side's one way to read or change a notebook's document, whether or not
 * anyone has it open: through the live room when the server runs one (so open editors see
 * the change at once), else through a room opened just for the job. Checkpoints, restore,
 * editions and export go through here, never around the Yjs log.
 */
export interface NotebookDocument {
  /** A copy of the current state, safe to keep. */
  readonly state: Uint8Array;
  /** The document as Tiptap JSON. */
  readonly json: Record<string, unknown>;
}

/** Reads a notebook's current document; null when the notebook does not exist. */
export async function readNotebookDocument({ db, notebookId }: { db: Db; notebookId: string }): Promise<NotebookDocument | null> {
  const codec = notebookJsonCodec();
  const live = registered()?.rooms.get(notebookId);
  if (live) {
    // Only bytes cross from the co-editing server's room (see NotebookRoom.currentState).
    const state = await live.currentState();
    const doc = new Y.Doc();
    try {
      Y.applyUpdate(doc, state);
      return { state, json: codec.readJson(doc) };
    } finally {
      doc.destroy();
    }
  }
  const stored = await getStoredNotebookDocument({ db, notebookId });
  if (!stored) return null;
  const doc = new Y.Doc();
  try {
    if (stored.snapshot) Y.applyUpdate(doc, stored.snapshot);
    for (const u of stored.updates) Y.applyUpdate(doc, u.data);
    // Never co-edited yet: the saved JSON is the document.
    if (!stored.snapshot && stored.updates.length === 0) {
      return { state: Y.encodeStateAsUpdate(doc), json: stored.content ?? { type: "doc", content: [{ type: "paragraph" }] } };
    }
    return { state: Y.encodeStateAsUpdate(doc), json: codec.readJson(doc) };
  } finally {
    doc.destroy();
  }
}

/**
 * Changes a notebook's document on the server. The change is stored like any author's
 * edit and reaches every open editor.
 *
 * @example
 * await editNotebookDocument({ db, notebookId, userId, edit: (doc) => replaceWithJson(doc, json) });
 */
export async function editNotebookDocument({ db, notebookId, userId, edit }: { db: Db; notebookId: string; userId: string | null; edit: (doc: Y.Doc) => void }): Promise<void> {
  const hub = registered();
  if (hub) {
    await hub.withRoom(notebookId, async (room) => room.applyServerUpdate(editAsUpdate(await room.currentState(), edit), userId));
    return;
  }
  const room = new NotebookRoom({ db, notebookId, codec: notebookJsonCodec() });
  try {
    await room.applyServerUpdate(editAsUpdate(await room.currentState(), edit), userId);
    await room.leaveEmpty();
  } finally {
    room.destroy();
  }
}

/** Runs `edit` on a copy of `state` (with this module's Yjs) and returns just what it changed. */
function editAsUpdate(state: Uint8Array, edit: (doc: Y.Doc) => void): Uint8Array {
  const copy = new Y.Doc({ gc: false });
  try {
    Y.applyUpdate(copy, state);
    const before = Y.encodeStateVector(copy);
    edit(copy);
    return Y.encodeStateAsUpdate(copy, before);
  } finally {
    copy.destroy();
  }
}

/** An edit that makes the document equal to `json` (a checkpoint restore). */
export function replaceWithJson(json: Record<string, unknown>): (doc: Y.Doc) => void {
  const codec = notebookJsonCodec();
  return (doc) => {
    Y.transact(doc, () => {
      const fragment = doc.getXmlFragment("notebook");
      fragment.delete(0, fragment.length);
      codec.writeJson(doc, json);
    });
  };
}
