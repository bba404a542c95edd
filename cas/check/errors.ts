/**
 * The two ways a check ends without a verdict of its own:
 * - {@link CasRequestError}: the request itself is at fault (unreadable LaTeX,
 *   too large, malformed) — it becomes a `CheckError` on the wire;
 * - {@link Undecidable}: the request is fine but the checker cannot decide —
 *   it becomes an `undecided` verdict with the reason.
 */
export type CasErrorCode = "malformed" | "unreadable" | "too_large" | "timeout" | "unknown_verb" | "internal";

export class CasRequestError extends Error {
  constructor(readonly code: CasErrorCode, message: string, readonly position?: number, readonly field?: string) {
    super(message);
    this.name = "CasRequestError";
  }
}

export class Undecidable extends Error {
  constructor(reason: string) {
    super(reason);
    this.name = "Undecidable";
  }
}
