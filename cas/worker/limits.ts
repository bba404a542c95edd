/**
 * Limits every cas verb runs under, wherever it runs (Node worker pool, Web
 * Worker, CLI). Readers add their own: 20,000 characters and 200 levels of
 * nesting per source; the checker refuses exponents above 1000 and trees of
 * more than 5000 nodes.
 */
export const DEFAULT_TIME_LIMIT_MS = 2000;
/** How long a new Web Worker may take to load its bundle before its request is given up. */
export const WORKER_STARTUP_LIMIT_MS = 30_000;
/** Largest JSON request accepted by the route and the CLI, in bytes. */
export const MAX_REQUEST_BYTES = 256 * 1024;
/** Heap of one Node worker; a request that needs more kills only its worker. */
export const WORKER_HEAP_MB = 256;
/** Requests waiting for a worker beyond this many are refused as busy. */
export const MAX_QUEUE = 64;

/** The refusal for a request that ran out of time. */
export function timeoutError(limitMs: number) {
  return { code: "timeout", message: `the request took longer than ${limitMs} ms and was stopped; simplify the step or split it` } as const;
}
