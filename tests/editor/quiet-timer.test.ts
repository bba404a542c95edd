import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { QuietTimer } from "@/editor/quiet-timer";

describe("QuietTimer", () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it("fires once, quietMs after the last of a burst of pokes", () => {
    const fire = vi.fn();
    const timer = new QuietTimer(400, fire);
    for (let i = 0; i < 10; i += 1) {
      timer.poke();
      vi.advanceTimersByTime(60);
    }
    expect(fire).not.toHaveBeenCalled();
    vi.advanceTimersByTime(339);
    expect(fire).not.toHaveBeenCalled();
    vi.advanceTimersByTime(1);
    expect(fire).toHaveBeenCalledTimes(1);
    expect(timer.waiting).toBe(false);
  });

  it("keeps at most one timeout pending however many pokes", () => {
    const timer = new QuietTimer(400, () => {});
    for (let i = 0; i < 50; i += 1) timer.poke();
    expect(vi.getTimerCount()).toBe(1);
  });

  it("does not fire after cancel, and can be poked again", () => {
    const fire = vi.fn();
    const timer = new QuietTimer(100, fire);
    timer.poke();
    timer.cancel();
    vi.advanceTimersByTime(500);
    expect(fire).not.toHaveBeenCalled();
    timer.poke();
    vi.advanceTimersByTime(100);
    expect(fire).toHaveBeenCalledTimes(1);
  });
});
