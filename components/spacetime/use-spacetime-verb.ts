"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import { createBrowserChecker, type BrowserChecker } from "@/cas/worker/browser-client";
import { isRefusal } from "./spacetime-request";

/** Longest a spacetime verb may run in the browser before it is stopped (Kerr's sheet takes seconds). */
const SPACETIME_TIME_LIMIT_MS = 120_000;

export type VerbRun<T> =
  | { readonly state: "idle" }
  | { readonly state: "running"; readonly startedAt: number }
  | { readonly state: "done"; readonly value: T; readonly ms: number }
  | { readonly state: "failed"; readonly message: string; readonly cancelled: boolean };

/**
 * Runs one spacetime verb at a time in its own Web Worker. Starting a new run or
 * cancelling aborts the running one, which terminates that worker (a fresh one
 * takes the next request), so a long curvature sheet never holds the page.
 */
export function useSpacetimeVerb<T>(verb: string) {
  const [run, setRun] = useState<VerbRun<T>>({ state: "idle" });
  const checker = useRef<BrowserChecker | null>(null);
  const current = useRef<AbortController | null>(null);

  useEffect(() => {
    const made = createBrowserChecker({ timeLimitMs: SPACETIME_TIME_LIMIT_MS });
    checker.current = made;
    return () => {
      current.current?.abort();
      made.dispose();
      checker.current = null;
    };
  }, []);

  const start = useCallback(async (input: unknown) => {
    current.current?.abort();
    const controller = new AbortController();
    current.current = controller;
    const startedAt = performance.now();
    setRun({ state: "running", startedAt });
    const made = checker.current ?? createBrowserChecker({ timeLimitMs: SPACETIME_TIME_LIMIT_MS });
    checker.current = made;
    const value = await made.run(verb, input, controller.signal);
    if (current.current !== controller) return; // superseded by a newer run
    current.current = null;
    if (isRefusal(value)) setRun({ state: "failed", message: value.error.message, cancelled: value.error.code === "aborted" });
    else setRun({ state: "done", value: value as T, ms: performance.now() - startedAt });
  }, [verb]);

  const cancel = useCallback(() => current.current?.abort(), []);
  return { run, start, cancel };
}
