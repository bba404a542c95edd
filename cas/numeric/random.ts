/**
 * A small deterministic pseudo-random stream (mulberry32), so a verdict can be
 * reproduced from the same request: the stream is started from a hash of the
 * request text rather than from the clock.
 *
 * @example
 * const rng = randomStream(hashText("x^2 = x x"));
 * rng.uniform(0.5, 2.5) // a number in [0.5, 2.5)
 */
export interface RandomStream {
  /** A float in [0, 1). */
  next(): number;
  /** A float in [lo, hi). */
  uniform(lo: number, hi: number): number;
}

export function randomStream(start: number): RandomStream {
  let state = start >>> 0;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return { next, uniform: (lo, hi) => lo + (hi - lo) * next() };
}

/** FNV-1a hash of a text, for starting a {@link randomStream}. */
export function hashText(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

/** A random decimal string with 12 significant digits (exact in decimal.js, so witnesses replay exactly). */
export function randomDecimalText(rng: RandomStream, lo: number, hi: number): string {
  return rng.uniform(lo, hi).toPrecision(12);
}
