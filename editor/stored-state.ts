import * as decoding from "lib0/decoding";
import * as Y from "yjs";

/**
 * Knows which of this client's own edits the co-editing server has stored. The server
 * stores an update before it broadcasts it, and broadcasts it to the sender too; its sync
 * step 1 carries its whole state vector. So "stored" is exact, not a guess from timers:
 * every clock of ours the server has echoed or announced is in its database.
 *
 * @example
 * const tracker = new StoredStateTracker(ydoc);
 * socket.addEventListener("message", (e) => tracker.noteServerMessage(new Uint8Array(e.data)));
 * tracker.unstoredCount() // 0 when everything typed here is on the server
 */
export class StoredStateTracker {
  private serverClock = 0;

  constructor(private readonly doc: Y.Doc) {}

  /** Reads one message of the y-websocket protocol as the server sent it. */
  noteServerMessage(message: Uint8Array): void {
    try {
      const decoder = decoding.createDecoder(message);
      if (decoding.readVarUint(decoder) !== 0) return; // not a sync message
      const syncType = decoding.readVarUint(decoder);
      const payload = decoding.readVarUint8Array(decoder);
      if (syncType === 0) this.noteClock(Y.decodeStateVector(payload).get(this.doc.clientID) ?? 0);
      else this.noteClock(endClockOf(payload, this.doc.clientID));
    } catch {
      // A message we cannot read says nothing about what is stored.
    }
  }

  private noteClock(clock: number): void {
    if (clock > this.serverClock) this.serverClock = clock;
  }

  /** How many of this client's operations (Yjs clock units) the server has not stored yet. */
  unstoredCount(): number {
    const local = Y.decodeStateVector(Y.encodeStateVector(this.doc)).get(this.doc.clientID) ?? 0;
    return Math.max(0, local - this.serverClock);
  }
}

/** The clock after the last operation of `client` in an update (Yjs's own state vector of an update counts only runs that start at 0). */
function endClockOf(update: Uint8Array, client: number): number {
  let end = 0;
  for (const struct of Y.decodeUpdate(update).structs) {
    if (struct.id.client === client) end = Math.max(end, struct.id.clock + struct.length);
  }
  return end;
}
