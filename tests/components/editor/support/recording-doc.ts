import * as Y from "yjs";

/**
 * A Y.Doc with a stand-in for a y-websocket / y-indexeddb listener: `record` is registered on
 * "update" the way those libraries register theirs, and keeps what it is given. `type` adds
 * characters one update each, like keystrokes; `replayed` is the text a fresh copy gets from
 * what was recorded.
 */
export function recordingDoc() {
  const doc = new Y.Doc();
  const recorded: Uint8Array[] = [];
  const record = (update: Uint8Array) => void recorded.push(update);
  doc.on("update", record);
  const type = (text: string) => {
    for (const ch of text) doc.getText("t").insert(doc.getText("t").length, ch);
  };
  const replayed = () => {
    const copy = new Y.Doc();
    for (const update of recorded) Y.applyUpdate(copy, update);
    return copy.getText("t").toString();
  };
  return { doc, recorded, record, type, replayed };
}
