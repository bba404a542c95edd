const ALPHABET = "0123456789abcdefghijklmnopqrstuvwxyz";

/**
 * A fresh, stable step id ("st-" and 10 random base-36 characters). Ids never change once
 * given, so citations and remarks can point at a step however the derivation is reordered.
 *
 * @example
 * newStepId() // "st-k3v9x0a1qz"
 */
export function newStepId(): string {
  const bytes = new Uint8Array(10);
  globalThis.crypto.getRandomValues(bytes);
  let id = "st-";
  for (const byte of bytes) id += ALPHABET[byte % ALPHABET.length];
  return id;
}
