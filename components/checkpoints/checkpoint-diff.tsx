"use client";

import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/components/data/api-client";
import { Notice } from "@/components/ui/notice";
import { TexLine } from "./tex-line";

type Side = { number: number; relation: string; kind: string; detail: string; verdict: string | null; method: { kind: string; detail?: string; points?: number } | null };
type Change =
  | { change: "added"; id: string; after: Side }
  | { change: "removed"; id: string; before: Side }
  | { change: "changed"; id: string; fields: string[]; before: Side; after: Side };
type Diff = { from: { label: string }; to: { label: string }; steps: Change[]; unchanged: number; otherContentChanged: boolean };

const marks: Record<Change["change"], { word: string; glyph: string }> = {
  added: { word: "Added", glyph: "+" },
  removed: { word: "Removed", glyph: "−" },
  changed: { word: "Changed", glyph: "~" },
};

function VerdictWord({ side }: { side: Side }) {
  if (!side.verdict) return null;
  const probabilistic = side.method?.kind === "numeric" ? " (numeric, probabilistic)" : "";
  return (
    <span className="text-xs text-ink-soft">
      {side.verdict}
      {probabilistic}
    </span>
  );
}

function SideLine({ label, side }: { label: string; side: Side }) {
  return (
    <div className="flex flex-wrap items-baseline gap-2">
      <span className="w-14 shrink-0 text-xs text-ink-muted">{label}</span>
      <span className="text-xs">({side.number})</span>
      <TexLine latex={side.relation || "\\text{(empty)}"} />
      <span className="text-xs italic">
        {side.kind}
        {side.detail ? ` ${side.detail}` : ""}
      </span>
      <VerdictWord side={side} />
    </div>
  );
}

/** What changed between two checkpoints, step by step (matched by step id), with verdicts on each side. */
export function CheckpointDiff({ notebookId, from, to }: { notebookId: string; from: string; to: string }) {
  const diff = useQuery({
    queryKey: ["checkpoint-diff", notebookId, from, to],
    queryFn: () => fetchJson<Diff>(`/api/notebooks/${notebookId}/checkpoints/${from}/diff/${to}`),
  });
  if (diff.isPending) return <p role="status" className="text-sm text-ink-muted">Comparing and re-checking the changed steps…</p>;
  if (diff.isError) return <Notice kind="problem">{diff.error.message}</Notice>;
  const { steps, unchanged, otherContentChanged } = diff.data;
  return (
    <section aria-label="Differences between the two checkpoints" className="space-y-2 rounded-md border border-paper-edge p-3">
      <p className="text-sm">
        From <strong>{diff.data.from.label || "unlabelled"}</strong> to <strong>{diff.data.to.label || "unlabelled"}</strong>: {steps.length} step
        {steps.length === 1 ? "" : "s"} differ, {unchanged} unchanged.
        {otherContentChanged ? " The prose, headings, spacetime blocks or figures changed too." : " Nothing outside the steps changed."}
      </p>
      <ul className="space-y-2">
        {steps.map((step) => (
          <li key={`${step.change}-${step.id}`} className="rounded border border-paper-edge bg-white/50 p-2">
            <p className="mb-1 text-xs font-semibold">
              <span aria-hidden="true">{marks[step.change].glyph} </span>
              {marks[step.change].word}
              {step.change === "changed" ? `: ${step.fields.join(", ")}` : ""}
            </p>
            {"before" in step && <SideLine label="Before" side={step.before} />}
            {"after" in step && <SideLine label="After" side={step.after} />}
          </li>
        ))}
      </ul>
    </section>
  );
}
