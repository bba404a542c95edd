import "server-only";
import { EventEmitter } from "node:events";

/**
 * Tells open co-editing sockets that someone's role changed, so a demoted author stops
 * writing at once. Route handlers (inside Next's bundle) and the socket server (loaded by
 * server.ts) are separate module instances in one process, hence the emitter lives on
 * globalThis.
 */
export interface MembershipChange {
  readonly groupId: string;
  readonly userId: string;
}

const key = Symbol.for("vierbein.collab.membership-events");
const emitter: EventEmitter = ((globalThis as Record<symbol, unknown>)[key] ??= new EventEmitter()) as EventEmitter;
emitter.setMaxListeners(0);

export function announceMembershipChange(change: MembershipChange): void {
  emitter.emit("change", change);
}

export function onMembershipChange(listener: (change: MembershipChange) => void): () => void {
  emitter.on("change", listener);
  return () => emitter.off("change", listener);
}
