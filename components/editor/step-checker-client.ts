"use client";

import type { CheckAnswer, CheckError, CheckRequest } from "@/cas/check/protocol";
import type { LimitProbeAnswer, LimitProbeRequest } from "@/cas/limit/protocol";
import { createBrowserChecker } from "@/cas/worker/browser-client";
import type { StepChecker } from "@/editor/step-checker";

function isCheckAnswer(value: unknown): value is CheckAnswer {
  const verdict = (value as { verdict?: unknown } | null)?.verdict;
  return verdict === "verified" || verdict === "refuted" || verdict === "undecided";
}

function asCheckError(value: unknown): CheckError | null {
  const error = (value as { error?: { code?: unknown; message?: unknown } } | null)?.error;
  if (error && typeof error.code === "string" && typeof error.message === "string") {
    return { error: { code: error.code, message: error.message, ...(typeof (error as { position?: unknown }).position === "number" ? { position: (error as { position: number }).position } : {}) } };
  }
  return null;
}

/**
 * Checks steps through `POST /api/cas/check`, for browsers that cannot run the checker's
 * worker. It answers only what the server's checker says, and reports an unreachable or
 * unknown answer as an error, never as a verdict.
 */
export function createHttpStepChecker(endpoint = "/api/cas/check"): StepChecker {
  return {
    async check(request: CheckRequest, signal?: AbortSignal): Promise<CheckAnswer | CheckError> {
      const response = await fetch(endpoint, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(request),
        signal,
      });
      const body: unknown = await response.json().catch(() => null);
      const answer = (body as { answer?: unknown } | null)?.answer ?? body;
      if (response.ok && isCheckAnswer(answer)) return answer;
      const error = asCheckError(body);
      if (error) return error;
      throw new Error(response.ok ? "The checker sent an answer the editor does not understand." : `The checker is unavailable (HTTP ${response.status}).`);
    },
  };
}

/**
 * Runs the limit probe through `POST /api/cas/limit` (the fallback for browsers without the
 * worker). Always resolves: an unreachable server or an unknown answer becomes an error.
 */
async function postLimitProbe(request: LimitProbeRequest, signal?: AbortSignal, endpoint = "/api/cas/limit"): Promise<LimitProbeAnswer | CheckError> {
  try {
    const response = await fetch(endpoint, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(request), signal });
    const body: unknown = await response.json().catch(() => null);
    if (response.ok && Array.isArray((body as { sides?: unknown } | null)?.sides)) return body as LimitProbeAnswer;
    return asCheckError(body) ?? { error: { code: "unavailable", message: `The checker is unavailable (HTTP ${response.status}).` } };
  } catch (err) {
    if (signal?.aborted) return { error: { code: "aborted", message: "the probe was cancelled" } };
    return { error: { code: "unavailable", message: err instanceof Error ? err.message : "The checker could not be reached." } };
  }
}

/** The checker the notebook uses, and how to let it go when the editor closes. */
export interface NotebookChecker extends StepChecker {
  /** Where checks run, for the status line: in this tab's worker, or on the server. */
  readonly where: "worker" | "server";
  /** The limit probe of one step (the `limit` verb), where the checks run. */
  probeLimit(request: LimitProbeRequest, signal?: AbortSignal): Promise<LimitProbeAnswer | CheckError>;
  dispose(): void;
}

/**
 * Checks in a Web Worker in this tab (the CAS browser client), so typing is never blocked
 * and the server is not asked for every keystroke; falls back to the HTTP route when the
 * browser cannot start a module worker.
 */
export function createNotebookChecker(): NotebookChecker {
  try {
    const worker = createBrowserChecker();
    return {
      where: "worker",
      check: (request, signal) => worker.check(request, signal),
      probeLimit: (request, signal) => worker.run("limit", request, signal) as Promise<LimitProbeAnswer | CheckError>,
      dispose: () => worker.dispose(),
    };
  } catch {
    const http = createHttpStepChecker();
    return { where: "server", check: http.check, probeLimit: (request, signal) => postLimitProbe(request, signal), dispose: () => {} };
  }
}
