import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { afterNextFrame } from "@/editor/after-frame";

describe("afterNextFrame", () => {
  let frames: (() => void)[] = [];
  beforeEach(() => {
    vi.useFakeTimers();
    frames = [];
  });
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
  });

  it("runs the task once, in a task after the frame's callbacks", () => {
    vi.stubGlobal("requestAnimationFrame", (callback: () => void) => frames.push(callback));
    const task = vi.fn();
    afterNextFrame(task);
    expect(task).not.toHaveBeenCalled();
    for (const frame of frames.splice(0)) frame();
    expect(task).not.toHaveBeenCalled();
    vi.advanceTimersByTime(0);
    expect(task).toHaveBeenCalledTimes(1);
    vi.advanceTimersByTime(500);
    expect(task).toHaveBeenCalledTimes(1);
  });

  it("runs it after the longest wait when no frame comes, and not again if one comes late", () => {
    vi.stubGlobal("requestAnimationFrame", (callback: () => void) => frames.push(callback));
    const task = vi.fn();
    afterNextFrame(task, 100);
    vi.advanceTimersByTime(100);
    expect(task).toHaveBeenCalledTimes(1);
    for (const frame of frames.splice(0)) frame();
    vi.advanceTimersByTime(10);
    expect(task).toHaveBeenCalledTimes(1);
  });

  it("works without requestAnimationFrame (Node)", () => {
    const task = vi.fn();
    afterNextFrame(task, 50);
    vi.advanceTimersByTime(50);
    expect(task).toHaveBeenCalledTimes(1);
  });
});
