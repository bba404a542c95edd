"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useId, useState } from "react";
import { ApiError } from "@/components/data/api-client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

type Refuted = { number: number; relation: string; witness?: Record<string, string> };
type Published = { number: number; sha256: string; url: string };

/** The lead's publishing form: re-checks every step on the server; a refuted step needs a stated reason. */
export function PublishForm({ notebookId, onClose }: { notebookId: string; onClose: () => void }) {
  const client = useQueryClient();
  const reasonId = useId();
  const [reason, setReason] = useState("");
  const [refuted, setRefuted] = useState<Refuted[] | null>(null);
  const publish = useMutation({
    mutationFn: async (): Promise<Published> => {
      const response = await fetch(`/api/notebooks/${notebookId}/editions`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(reason.trim() ? { reason: reason.trim() } : {}),
      });
      const body = await response.json().catch(() => null);
      if (response.status === 409 && body?.refuted) {
        setRefuted(body.refuted);
        throw new ApiError(body.error.message, 409, body.error.code);
      }
      if (!response.ok) throw new ApiError(body?.error?.message ?? `The server answered ${response.status}.`, response.status);
      return body;
    },
    onSuccess: () => void client.invalidateQueries({ queryKey: ["editions", notebookId] }),
  });

  if (publish.data) {
    return (
      <div className="space-y-2">
        <Notice kind="success">
          Edition {publish.data.number} is published and frozen. Permanent link: <a href={publish.data.url}>{publish.data.url}</a>
        </Notice>
        <Button tone="quiet" onClick={onClose}>
          Close
        </Button>
      </div>
    );
  }

  return (
    <form
      aria-label="Publish an edition"
      className="space-y-3 rounded-md border border-paper-edge bg-white/60 p-3"
      onSubmit={(event) => {
        event.preventDefault();
        publish.mutate();
      }}
    >
      <p className="text-sm">
        Publishing re-runs the check of every step on the server, records each verdict in the edition’s check ledger and freezes the text for good. It can take a minute.
      </p>
      {publish.isError && <Notice kind="problem">{publish.error.message}</Notice>}
      {refuted && (
        <ul className="list-disc pl-5 text-sm" aria-label="Refuted steps">
          {refuted.map((entry) => (
            <li key={entry.number}>
              Step {entry.number} is refuted
              {entry.witness ? ` (the two sides differ at ${Object.entries(entry.witness).map(([k, v]) => `${k} = ${v}`).join(", ")})` : ""}.
            </li>
          ))}
        </ul>
      )}
      <div className="flex flex-col gap-1">
        <label htmlFor={reasonId} className="text-sm font-medium">
          Reason for publishing with refuted steps{refuted ? "" : " (only needed if a step is refuted)"}
        </label>
        <textarea id={reasonId} value={reason} maxLength={2000} rows={2} onChange={(e) => setReason(e.target.value)} className="rounded-md border border-paper-edge bg-white/70 px-2 py-1 text-sm" />
      </div>
      <div className="flex gap-2">
        <Button type="submit" disabled={publish.isPending || (refuted !== null && !reason.trim())}>
          {publish.isPending ? "Checking every step…" : "Publish edition"}
        </Button>
        <Button tone="quiet" onClick={onClose}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
