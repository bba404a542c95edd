"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { createColumnHelper } from "@tanstack/react-table";
import { useId, useMemo, useState } from "react";
import { fetchJson } from "@/components/data/api-client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { PagedTable } from "@/components/ui/paged-table";
import { CheckpointDiff } from "./checkpoint-diff";

type Checkpoint = { id: string; kind: "manual" | "auto" | "before-restore"; label: string; createdByName: string | null; createdAt: string };

const kindWords: Record<Checkpoint["kind"], string> = { manual: "By hand", auto: "Automatic", "before-restore": "Before a restore" };
const dateFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" });
const column = createColumnHelper<Checkpoint>();

/** Save, list, compare and restore checkpoints of one notebook. */
export function CheckpointSection({ notebookId, canWrite }: { notebookId: string; canWrite: boolean }) {
  const client = useQueryClient();
  const labelId = useId();
  const kindId = useId();
  const key = ["checkpoints", notebookId];
  const list = useQuery({ queryKey: key, queryFn: () => fetchJson<{ checkpoints: Checkpoint[] }>(`/api/notebooks/${notebookId}/checkpoints`) });
  const [label, setLabel] = useState("");
  const [kind, setKind] = useState<"" | Checkpoint["kind"]>("");
  const [picked, setPicked] = useState<string[]>([]);
  const [confirming, setConfirming] = useState<Checkpoint | null>(null);
  const [done, setDone] = useState<string | null>(null);

  const save = useMutation({
    mutationFn: (text: string) => fetchJson(`/api/notebooks/${notebookId}/checkpoints`, { method: "POST", json: { label: text } }),
    onSuccess: () => {
      setLabel("");
      setDone("Checkpoint saved.");
      void client.invalidateQueries({ queryKey: key });
    },
  });
  const restore = useMutation({
    mutationFn: (id: string) => fetchJson(`/api/notebooks/${notebookId}/checkpoints/${id}/restore`, { method: "POST" }),
    onSuccess: () => {
      setConfirming(null);
      setDone("Restored. What was there before is kept as a “before a restore” checkpoint.");
      void client.invalidateQueries({ queryKey: key });
    },
  });

  const toggle = (id: string) => setPicked((now) => (now.includes(id) ? now.filter((p) => p !== id) : [...now.slice(-1), id]));

  const columns = useMemo(
    () => [
      column.display({
        id: "pick",
        header: "Compare",
        cell: ({ row }) => (
          <input
            type="checkbox"
            aria-label={`Compare “${row.original.label || kindWords[row.original.kind]}”`}
            checked={picked.includes(row.original.id)}
            onChange={() => toggle(row.original.id)}
          />
        ),
      }),
      column.accessor("label", { header: "Label", cell: (info) => info.getValue() || <span className="text-ink-muted">(no label)</span> }),
      column.accessor("kind", { header: "Made", cell: (info) => kindWords[info.getValue()], filterFn: "equalsString" }),
      column.accessor((row) => row.createdByName ?? "Vierbein", { id: "author", header: "By" }),
      column.accessor("createdAt", {
        header: "When",
        sortingFn: "datetime",
        cell: (info) => <time dateTime={info.getValue()}>{dateFormat.format(new Date(info.getValue()))}</time>,
      }),
      ...(canWrite
        ? [
            column.display({
              id: "restore",
              header: () => <span className="sr-only">Restore</span>,
              cell: ({ row }) => (
                <Button tone="quiet" className="!px-2 !py-0.5 text-xs" onClick={() => setConfirming(row.original)}>
                  Restore<span className="sr-only"> “{row.original.label || kindWords[row.original.kind]}”</span>
                </Button>
              ),
            }),
          ]
        : []),
    ],
    [picked, canWrite],
  );

  const rows = useMemo(() => list.data?.checkpoints ?? [], [list.data]);
  // Compare oldest → newest, whichever order they were ticked in.
  const pair = picked.length === 2 ? [...picked].sort((a, b) => rows.findIndex((r) => r.id === b) - rows.findIndex((r) => r.id === a)) : null;

  return (
    <section aria-labelledby={`${labelId}-title`} className="space-y-3">
      <h2 id={`${labelId}-title`} className="font-serif text-xl font-semibold">
        Checkpoints
      </h2>
      {done && <Notice kind="success">{done}</Notice>}
      {(save.error ?? restore.error) && <Notice kind="problem">{(save.error ?? restore.error)!.message}</Notice>}
      {canWrite && (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(event) => {
            event.preventDefault();
            if (label.trim()) save.mutate(label.trim());
          }}
        >
          <div className="flex flex-col gap-1">
            <label htmlFor={labelId} className="text-xs font-medium text-ink-soft">
              Checkpoint label
            </label>
            <input id={labelId} value={label} maxLength={200} onChange={(e) => setLabel(e.target.value)} className="rounded-md border border-paper-edge bg-white/70 px-2 py-1 text-sm" />
          </div>
          <Button type="submit" disabled={!label.trim() || save.isPending}>
            {save.isPending ? "Saving…" : "Save checkpoint"}
          </Button>
        </form>
      )}
      {confirming && (
        <div role="alertdialog" aria-label="Confirm restore" className="space-y-2 rounded-md border border-alarm bg-alarm-wash p-3 text-sm">
          <p>
            Make “{confirming.label || kindWords[confirming.kind]}” the current state? Co-authors see it at once. The present state is saved first as a checkpoint, so nothing is lost.
          </p>
          <div className="flex gap-2">
            <Button tone="danger" disabled={restore.isPending} onClick={() => restore.mutate(confirming.id)}>
              {restore.isPending ? "Restoring…" : "Restore it"}
            </Button>
            <Button tone="quiet" onClick={() => setConfirming(null)}>
              Keep the current state
            </Button>
          </div>
        </div>
      )}
      {list.isError ? (
        <Notice kind="problem">{list.error.message}</Notice>
      ) : (
        <PagedTable
          caption="Checkpoints of this notebook"
          data={rows}
          columns={columns}
          initialSort={[{ id: "createdAt", desc: true }]}
          searchLabel="Find by label or person"
          columnFilters={kind ? [{ id: "kind", value: kind }] : []}
          filters={
            <div className="flex flex-col gap-1">
              <label htmlFor={kindId} className="text-xs font-medium text-ink-soft">
                Made
              </label>
              <select id={kindId} value={kind} onChange={(e) => setKind(e.target.value as typeof kind)} className="rounded-md border border-paper-edge bg-white/70 px-2 py-1 text-sm">
                <option value="">Any way</option>
                <option value="manual">By hand</option>
                <option value="auto">Automatic</option>
                <option value="before-restore">Before a restore</option>
              </select>
            </div>
          }
          emptyText={list.isPending ? "Loading…" : "No checkpoints yet."}
        />
      )}
      {pair ? <CheckpointDiff notebookId={notebookId} from={pair[0]} to={pair[1]} /> : <p className="text-xs text-ink-muted">Tick two checkpoints to see what changed between them.</p>}
    </section>
  );
}
