import "server-only";
import * as decoding from "lib0/decoding";
import * as encoding from "lib0/encoding";
import * as syncProtocol from "y-protocols/sync";

/** Top-level message types of the y-websocket protocol (as the y-websocket client numbers them). */
export const MESSAGE_SYNC = 0;
export const MESSAGE_AWARENESS = 1;
export const MESSAGE_QUERY_AWARENESS = 3;

/** One decoded client message, split so the room can decide what a read-only peer may do. */
export type ClientMessage =
  | { type: "sync-step-1"; stateVector: Uint8Array }
  | { type: "update"; update: Uint8Array }
  | { type: "awareness"; update: Uint8Array }
  | { type: "query-awareness" };

/** Decodes a binary client message; throws on anything malformed or unknown. */
export function decodeClientMessage(data: Uint8Array): ClientMessage {
  const decoder = decoding.createDecoder(data);
  const type = decoding.readVarUint(decoder);
  switch (type) {
    case MESSAGE_SYNC: {
      const syncType = decoding.readVarUint(decoder);
      const payload = decoding.readVarUint8Array(decoder);
      if (syncType === syncProtocol.messageYjsSyncStep1) return { type: "sync-step-1", stateVector: payload };
      if (syncType === syncProtocol.messageYjsSyncStep2 || syncType === syncProtocol.messageYjsUpdate) return { type: "update", update: payload };
      throw new Error(`unknown sync message ${syncType}`);
    }
    case MESSAGE_AWARENESS:
      return { type: "awareness", update: decoding.readVarUint8Array(decoder) };
    case MESSAGE_QUERY_AWARENESS:
      return { type: "query-awareness" };
    default:
      throw new Error(`unknown message type ${type}`);
  }
}

function encodeSync(syncType: number, payload: Uint8Array): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_SYNC);
  encoding.writeVarUint(encoder, syncType);
  encoding.writeVarUint8Array(encoder, payload);
  return encoding.toUint8Array(encoder);
}

export const encodeSyncStep1 = (stateVector: Uint8Array) => encodeSync(syncProtocol.messageYjsSyncStep1, stateVector);
export const encodeSyncStep2 = (diff: Uint8Array) => encodeSync(syncProtocol.messageYjsSyncStep2, diff);
export const encodeUpdate = (update: Uint8Array) => encodeSync(syncProtocol.messageYjsUpdate, update);

export function encodeAwareness(update: Uint8Array): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_AWARENESS);
  encoding.writeVarUint8Array(encoder, update);
  return encoding.toUint8Array(encoder);
}
