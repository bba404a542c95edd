"use client";

import { useEffect, useState } from "react";
import type { VerbRun } from "./use-spacetime-verb";

/**
 * What a spacetime computation is doing: working (time so far, a Cancel button),
 * stopped by the author, or failed with the engine's message in plain words.
 */
export function ComputationStatus({ run, what, onCancel, onRetry }: { run: VerbRun<unknown>; what: string; onCancel: () => void; onRetry: () => void }) {
  const [now, setNow] = useState(() => performance.now());
  useEffect(() => {
    if (run.state !== "running") return;
    const timer = setInterval(() => setNow(performance.now()), 100);
    return () => clearInterval(timer);
  }, [run.state]);

  if (run.state === "running") {
    const seconds = Math.max(0, (now - run.startedAt) / 1000);
    return (
      <div role="status" className="flex flex-wrap items-center gap-3 rounded-md border border-paper-edge bg-paper-deep px-3 py-2 font-sans text-sm">
        <progress aria-label={`Computing ${what}`} className="h-2 w-32 accent-accent" />
        <span>
          Computing {what} in a background worker… {seconds.toFixed(1)} s
        </span>
        <button type="button" onClick={onCancel} className="rounded border border-alarm px-2 py-0.5 text-alarm hover:bg-alarm-wash">
          Cancel
        </button>
      </div>
    );
  }
  if (run.state === "failed") {
    return (
      <div role={run.cancelled ? "status" : "alert"} className={`flex flex-wrap items-center gap-3 rounded-md border px-3 py-2 font-sans text-sm ${run.cancelled ? "border-paper-edge bg-paper-deep" : "border-alarm bg-alarm-wash"}`}>
        <span>
          <span aria-hidden="true" className="mr-1 font-semibold">{run.cancelled ? "○" : "✕"}</span>
          {run.cancelled ? `Stopped: ${what} was cancelled.` : `Could not compute ${what}: ${run.message}`}
        </span>
        <button type="button" onClick={onRetry} className="rounded border border-paper-edge px-2 py-0.5 hover:bg-paper">
          Compute again
        </button>
      </div>
    );
  }
  return null;
}
