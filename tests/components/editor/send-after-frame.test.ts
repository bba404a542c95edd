import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import * as Y from "yjs";
import type { WebsocketProvider } from "y-websocket";
import { sendEditsAfterFrame } from "@/components/editor/send-after-frame";
import { recordingDoc } from "./support/recording-doc";

describe("sendEditsAfterFrame", () => {
  let frames: (() => void)[] = [];
  beforeEach(() => {
    vi.useFakeTimers();
    frames = [];
    vi.stubGlobal("requestAnimationFrame", (callback: () => void) => frames.push(callback));
  });
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
  });

  /** A document with a stand-in provider that records what it would broadcast. */
  const setup = () => {
    const { doc, recorded: sent, record, type, replayed: received } = recordingDoc();
    const provider = { _updateHandler: record } as unknown as WebsocketProvider;
    const undo = sendEditsAfterFrame(provider, doc);
    return { doc, provider, sent, undo, type, received };
  };

  it("holds edits until the next frame has been drawn, then sends them as one message", () => {
    const { sent, type, received } = setup();
    type("E^2");
    expect(sent).toHaveLength(0);
    for (const frame of frames.splice(0)) frame();
    expect(sent).toHaveLength(0); // after the frame, not inside it
    vi.advanceTimersByTime(0);
    expect(sent).toHaveLength(1);
    expect(received()).toBe("E^2");
  });

  it("sends within 100 ms when no frame comes (a hidden tab), and never echoes the server's updates", () => {
    const { doc, provider, sent, type } = setup();
    type("L");
    vi.advanceTimersByTime(100);
    expect(sent).toHaveLength(1);
    const remote = new Y.Doc();
    remote.getText("t").insert(0, "from a co-author");
    Y.applyUpdate(doc, Y.encodeStateAsUpdate(remote), provider);
    vi.advanceTimersByTime(200);
    expect(sent).toHaveLength(1);
  });

  it("sends what it holds when undone, and stops holding", () => {
    const { sent, type, undo, received } = setup();
    type("ab");
    undo();
    expect(received()).toBe("ab");
    type("c");
    vi.advanceTimersByTime(200);
    expect(sent).toHaveLength(1);
  });
});
