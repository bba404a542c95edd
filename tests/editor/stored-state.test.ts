import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import { encodeSyncStep1, encodeSyncStep2, encodeUpdate } from "@/app/_server/collab/protocol";
import { StoredStateTracker } from "@/editor/stored-state";

describe("StoredStateTracker", () => {
  it("counts this client's edits until the server echoes them", () => {
    const doc = new Y.Doc();
    const tracker = new StoredStateTracker(doc);
    const updates: Uint8Array[] = [];
    doc.on("update", (u: Uint8Array) => updates.push(u));
    doc.getText("t").insert(0, "abc");
    doc.getText("t").insert(3, "de");
    expect(tracker.unstoredCount()).toBe(5);
    tracker.noteServerMessage(encodeUpdate(updates[0]));
    expect(tracker.unstoredCount()).toBe(2);
    tracker.noteServerMessage(encodeUpdate(updates[1]));
    expect(tracker.unstoredCount()).toBe(0);
  });

  it("takes the server's state vector from its sync step 1 and ignores other clients' edits", () => {
    const doc = new Y.Doc();
    const other = new Y.Doc();
    const tracker = new StoredStateTracker(doc);
    doc.getText("t").insert(0, "mine");
    other.getText("t").insert(0, "theirs");
    tracker.noteServerMessage(encodeSyncStep2(Y.encodeStateAsUpdate(other)));
    expect(tracker.unstoredCount()).toBe(4);
    const server = new Y.Doc();
    Y.applyUpdate(server, Y.encodeStateAsUpdate(doc));
    tracker.noteServerMessage(encodeSyncStep1(Y.encodeStateVector(server)));
    expect(tracker.unstoredCount()).toBe(0);
  });

  it("ignores messages it cannot read", () => {
    const doc = new Y.Doc();
    const tracker = new StoredStateTracker(doc);
    doc.getText("t").insert(0, "x");
    tracker.noteServerMessage(new Uint8Array([0, 2, 250]));
    tracker.noteServerMessage(new Uint8Array([1, 0]));
    expect(tracker.unstoredCount()).toBe(1);
  });
});
