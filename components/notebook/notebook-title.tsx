"use client";

import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { useRenameNotebook } from "@/components/data/queries";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

/** The notebook's title; authors and group leads can rename it in place. */
export function NotebookTitle({ notebookId, title, canRename }: { notebookId: string; title: string; canRename: boolean }) {
  const router = useRouter();
  const inputId = useId();
  const rename = useRenameNotebook(notebookId);
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState(title);

  if (!editing)
    return (
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="font-serif text-3xl font-semibold tracking-tight">{title}</h1>
        {canRename && (
          <button type="button" onClick={() => setEditing(true)} className="text-sm text-accent underline underline-offset-2">
            Rename<span className="sr-only"> the notebook</span>
          </button>
        )}
      </div>
    );

  return (
    <form
      className="space-y-2"
      onSubmit={async (event) => {
        event.preventDefault();
        const next = draft.trim();
        if (!next || next === title) return setEditing(false);
        try {
          await rename.mutateAsync(next);
          setEditing(false);
          router.refresh();
        } catch {
          // Shown from the mutation's error below.
        }
      }}
    >
      {rename.isError && <Notice kind="problem">{rename.error.message}</Notice>}
      <label htmlFor={inputId} className="sr-only">
        Notebook title
      </label>
      <div className="flex flex-wrap gap-2">
        <input
          id={inputId}
          value={draft}
          maxLength={200}
          autoFocus
          onChange={(event) => setDraft(event.target.value)}
          className="min-w-0 flex-1 rounded-md border border-paper-edge bg-white/70 px-3 py-1.5 font-serif text-2xl"
        />
        <Button type="submit" disabled={rename.isPending}>
          {rename.isPending ? "Saving…" : "Save title"}
        </Button>
        <Button tone="quiet" onClick={() => setEditing(false)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
