"use client";

import { useState } from "react";
import { ApiError } from "@/components/data/api-client";

/**
 * The problem line of a form that posts to our API: cleared each time the form is sent,
 * then the server's own message if it gave one, else `fallback`.
 */
export function useApiProblem(fallback: string) {
  const [problem, setProblem] = useState<string | null>(null);
  async function attempt(send: () => Promise<void>): Promise<void> {
    setProblem(null);
    try {
      await send();
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : fallback);
    }
  }
  return { problem, attempt };
}
