import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { IndexeddbPersistence } from "y-indexeddb";
import { batchLocalCopyWrites } from "@/components/editor/batched-local-copy";
import { recordingDoc } from "./support/recording-doc";

// The page objects the batcher listens to, as plain event targets (the tests run in Node).
const page = { document: Object.assign(new EventTarget(), { visibilityState: "visible" }), window: new EventTarget() };

describe("batchLocalCopyWrites", () => {
  beforeEach(() => {
    vi.useFakeTimers();
    vi.stubGlobal("document", page.document);
    vi.stubGlobal("window", page.window);
  });
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
  });

  /** A document with a stand-in for y-indexeddb: it records what would be written. */
  const setup = () => {
    const { doc, recorded: written, record, type, replayed } = recordingDoc();
    const local = { _storeUpdate: record } as unknown as IndexeddbPersistence;
    const undo = batchLocalCopyWrites(local, doc);
    return { doc, written, undo, type, replayed };
  };

  it("writes one merged update after typing pauses, holding everything typed", () => {
    const { written, type, replayed } = setup();
    type("r_s = 2GM/c^2");
    expect(written).toHaveLength(0);
    vi.advanceTimersByTime(250);
    expect(written).toHaveLength(1);
    expect(replayed()).toBe("r_s = 2GM/c^2");
  });

  it("writes at once when the page is hidden or closed, and when undone", () => {
    const { written, type, undo, replayed } = setup();
    type("ab");
    page.window.dispatchEvent(new Event("pagehide"));
    expect(written).toHaveLength(1);
    type("cd");
    undo();
    expect(written).toHaveLength(2);
    expect(replayed()).toBe("abcd");
    type("ef");
    vi.advanceTimersByTime(1000);
    expect(written).toHaveLength(2); // no longer batching, and y-indexeddb's own listener was removed
  });

  it("does not hold more than two seconds of continuous typing", () => {
    const { written, type } = setup();
    for (let i = 0; i < 40; i += 1) {
      type("x");
      vi.advanceTimersByTime(60);
    }
    expect(written.length).toBeGreaterThanOrEqual(1);
  });
});
