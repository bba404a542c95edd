"use client";

import type { CheckAnswer, CheckError, CheckRequest } from "@/cas/check/protocol";
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

/** The checker the notebook uses, and how to let it go when the editor closes. */
export interface NotebookChecker extends StepChecker {
  /** Where checks run, for the status line: in this tab's worker, or on the server. */
  readonly where: "worker" | "server";
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
    return { where: "worker", check: (request, signal) => worker.check(request, signal), dispose: () => worker.dispose() };
  } catch {
    const http = createHttpStepChecker();
    return { where: "server", check: http.check, dispose: () => {} };
  }
}
