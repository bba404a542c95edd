"use client";

import type { Editor } from "@tiptap/core";
import { useCallback, useEffect, useRef, useState } from "react";

export type SaveState =
  | { readonly kind: "saved"; readonly at: Date | null }
  | { readonly kind: "unsaved" }
  | { readonly kind: "saving" }
  | { readonly kind: "failed"; readonly message: string };

async function messageOf(response: Response): Promise<string> {
  const body = (await response.json().catch(() => null)) as { error?: { message?: string } } | null;
  return body?.error?.message ?? `The server answered ${response.status}.`;
}

/**
 * Saves the notebook's Tiptap JSON with `PATCH /api/notebooks/:id { content }` a moment after
 * typing stops. A save that fails keeps the text in the editor, says so, and is retried on
 * the next change or by hand; leaving the page with unsaved changes asks first.
 */
export function useAutosave(editor: Editor | null, notebookId: string, enabled: boolean, delayMs = 1500) {
  const [state, setState] = useState<SaveState>({ kind: "saved", at: null });
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const inFlight = useRef<Promise<void> | null>(null);
  const dirty = useRef(false);

  const save = useCallback(async () => {
    if (!editor || editor.isDestroyed || !enabled) return;
    if (inFlight.current) await inFlight.current; // one save at a time, in order
    if (!dirty.current) return;
    dirty.current = false;
    setState({ kind: "saving" });
    const content = editor.getJSON();
    const run = (async () => {
      try {
        const response = await fetch(`/api/notebooks/${encodeURIComponent(notebookId)}`, {
          method: "PATCH",
          headers: { "content-type": "application/json" },
          body: JSON.stringify({ content }),
        });
        if (!response.ok) throw new Error(await messageOf(response));
        setState(dirty.current ? { kind: "unsaved" } : { kind: "saved", at: new Date() });
      } catch (cause) {
        dirty.current = true;
        setState({ kind: "failed", message: cause instanceof Error ? cause.message : "The save did not reach the server." });
      } finally {
        inFlight.current = null;
      }
    })();
    inFlight.current = run;
    await run;
  }, [editor, enabled, notebookId]);

  useEffect(() => {
    if (!editor || !enabled) return;
    const onUpdate = () => {
      dirty.current = true;
      setState((s) => (s.kind === "failed" ? s : { kind: "unsaved" }));
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => void save(), delayMs);
    };
    const onLeave = (event: BeforeUnloadEvent) => {
      if (dirty.current || inFlight.current) event.preventDefault();
    };
    editor.on("update", onUpdate);
    window.addEventListener("beforeunload", onLeave);
    return () => {
      editor.off("update", onUpdate);
      window.removeEventListener("beforeunload", onLeave);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [editor, enabled, save, delayMs]);

  return { state, saveNow: save };
}
