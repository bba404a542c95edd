"use client";

import type { SaveState } from "./use-autosave";

/** The saved state in words, with a retry when a save failed. */
export function SaveIndicator({ state, onRetry }: { state: SaveState; onRetry: () => void }) {
  const text =
    state.kind === "saved"
      ? state.at
        ? `Saved ${state.at.toLocaleTimeString([], { hour: "2-digit", minute: "2-digit" })}`
        : "All changes saved"
      : state.kind === "saving"
        ? "Saving…"
        : state.kind === "unsaved"
          ? "Unsaved changes"
          : `Not saved: ${state.message}`;
  return (
    <p role="status" aria-live="polite" className={`flex items-center gap-2 font-sans text-xs ${state.kind === "failed" ? "text-alarm" : "text-ink-muted"}`}>
      <span aria-hidden="true">{state.kind === "saved" ? "●" : state.kind === "failed" ? "▲" : "○"}</span>
      {text}
      {state.kind === "failed" ? (
        <button type="button" onClick={onRetry} className="rounded border border-alarm px-1.5 py-0.5 hover:bg-alarm-wash">
          Try again
        </button>
      ) : null}
    </p>
  );
}
