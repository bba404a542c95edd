import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import * as Y from "yjs";
import { Awareness } from "y-protocols/awareness";
import { CARET_MAX_WAIT_MS, CARET_QUIET_MS, pacedAwareness } from "@/editor/paced-awareness";

describe("pacedAwareness", () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  const setup = () => {
    const awareness = new Awareness(new Y.Doc());
    const changes = vi.fn();
    awareness.on("change", changes);
    return { awareness, paced: pacedAwareness(awareness, "cursor"), changes };
  };

  it("publishes the last caret position once typing pauses", () => {
    const { awareness, paced, changes } = setup();
    for (let i = 1; i <= 3; i += 1) {
      paced.setLocalStateField("cursor", { anchor: i, head: i });
      vi.advanceTimersByTime(60);
    }
    expect(changes).not.toHaveBeenCalled();
    vi.advanceTimersByTime(CARET_QUIET_MS);
    expect(changes).toHaveBeenCalledTimes(1);
    expect(awareness.getLocalState()?.cursor).toEqual({ anchor: 3, head: 3 });
  });

  it("still publishes at least every CARET_MAX_WAIT_MS while the author keeps typing", () => {
    const { paced, changes } = setup();
    for (let t = 0; t < CARET_MAX_WAIT_MS + 60; t += 60) {
      paced.setLocalStateField("cursor", { anchor: t, head: t });
      vi.advanceTimersByTime(60);
    }
    vi.advanceTimersByTime(100); // the overdue publication waits for a frame (here: its 100 ms fallback)
    expect(changes).toHaveBeenCalledTimes(1);
  });

  it("clears the caret at once, passes other fields through, and reads like the awareness", () => {
    const { awareness, paced, changes } = setup();
    paced.setLocalStateField("cursor", { anchor: 1, head: 1 });
    paced.setLocalStateField("cursor", null);
    expect(changes).toHaveBeenCalledTimes(1);
    expect(awareness.getLocalState()?.cursor).toBeNull();
    vi.advanceTimersByTime(CARET_QUIET_MS * 2);
    expect(changes).toHaveBeenCalledTimes(1);
    paced.setLocalStateField("user", { name: "A. Author" });
    expect(paced.getLocalState()?.user).toEqual({ name: "A. Author" });
    expect(paced.clientID).toBe(awareness.clientID);
  });
});
