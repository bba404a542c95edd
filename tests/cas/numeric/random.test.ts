import { describe, expect, it } from "vitest";
import { hashText, randomStream } from "../../../cas/numeric/random";

describe("randomStream", () => {
  it("repeats for the same start and stays in range", () => {
    const a = randomStream(hashText("step"));
    const b = randomStream(hashText("step"));
    const xs = Array.from({ length: 100 }, () => a.uniform(0.5, 2.5));
    expect(xs).toEqual(Array.from({ length: 100 }, () => b.uniform(0.5, 2.5)));
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(0.5);
    expect(Math.max(...xs)).toBeLessThan(2.5);
    expect(hashText("a")).not.toBe(hashText("b"));
  });
});
