import { afterNextFrame } from "./after-frame";
import { QuietTimer } from "./quiet-timer";

/** The part of a y-protocols Awareness this module touches. */
interface AwarenessLike {
  setLocalStateField(field: string, value: unknown): void;
}

/** How long the caret must rest, and the longest it waits while the author keeps typing. */
export const CARET_QUIET_MS = 150;
export const CARET_MAX_WAIT_MS = 500;

/**
 * The awareness as the caret plugin sees it: our own caret position is published once typing
 * pauses (while typing goes on, every CARET_MAX_WAIT_MS, after a frame), not on every keystroke. Each publication is
 * sent to every co-author and makes the caret plugin dispatch a second editor transaction, which
 * cost about a millisecond per keystroke. Clearing the caret (blur, close) goes out at once.
 *
 * @example
 * CollaborationCaret.configure({ provider: { ...provider, awareness: pacedAwareness(provider.awareness, "cursor") } })
 */
export function pacedAwareness<A extends AwarenessLike>(awareness: A, field: string, quietMs = CARET_QUIET_MS, maxWaitMs = CARET_MAX_WAIT_MS): A {
  let latest: unknown = undefined;
  let firstHeldAt: number | null = null;
  let overdue = false;
  const publish = () => {
    firstHeldAt = null;
    overdue = false;
    awareness.setLocalStateField(field, latest);
  };
  const quiet = new QuietTimer(quietMs, publish);
  const paced = (value: unknown) => {
    latest = value;
    if (value === null) {
      quiet.cancel();
      publish();
      return;
    }
    const now = Date.now();
    firstHeldAt ??= now;
    if (overdue) return;
    if (now - firstHeldAt >= maxWaitMs) {
      // Held too long while typing goes on: publish, but after this keystroke's frame.
      quiet.cancel();
      overdue = true;
      afterNextFrame(publish);
      return;
    }
    quiet.poke();
  };
  return new Proxy(awareness, {
    get(target, property) {
      if (property === "setLocalStateField") {
        return (name: string, value: unknown) => (name === field ? paced(value) : target.setLocalStateField(name, value));
      }
      const value: unknown = Reflect.get(target, property, target);
      return typeof value === "function" ? value.bind(target) : value;
    },
  });
}
