"use client";

import type { VerdictTally } from "@/editor/step-verdicts";
import { VerdictShape } from "./verdict-mark";

/**
 * One line with the count of each verdict, a button to jump to the first refuted step, and
 * a plain note when some verdicts rest on numeric probing.
 */
export function VerdictSummary({ tally, probabilistic, onJumpToRefuted }: { tally: VerdictTally; probabilistic: number; onJumpToRefuted: (() => void) | null }) {
  const total = tally.verified + tally.refuted + tally.undecided + tally.pending + tally.notChecked;
  const parts: Array<{ word: "verified" | "refuted" | "undecided" | "pending" | "not checked"; count: number; tone: string }> = [
    { word: "verified", count: tally.verified, tone: "text-accent" },
    { word: "refuted", count: tally.refuted, tone: "text-alarm" },
    { word: "undecided", count: tally.undecided, tone: "text-[#7a5a12]" },
    { word: "pending", count: tally.pending, tone: "text-ink-muted" },
    { word: "not checked", count: tally.notChecked, tone: "text-ink-muted" },
  ];
  return (
    <div className="font-sans text-sm">
      <p className="flex flex-wrap items-center gap-x-3 gap-y-1" aria-label="Verdict summary">
        <span className="text-ink-soft">{total} step{total === 1 ? "" : "s"}:</span>
        {parts
          .filter((p) => p.count > 0 || p.word === "verified" || p.word === "refuted")
          .map((p) => (
            <span key={p.word} className={`inline-flex items-center gap-1 ${p.tone}`}>
              <VerdictShape word={p.word} />
              {p.count} {p.word}
            </span>
          ))}
        {onJumpToRefuted ? (
          <button type="button" onClick={onJumpToRefuted} className="rounded border border-alarm px-2 py-0.5 text-xs text-alarm hover:bg-alarm-wash">
            Go to first refuted step
          </button>
        ) : null}
      </p>
      {probabilistic > 0 ? (
        <p className="mt-1 text-xs text-ink-muted">
          {probabilistic} verified step{probabilistic === 1 ? " rests" : "s rest"} on numeric probing at random points: probabilistic evidence, not a proof.
        </p>
      ) : null}
    </div>
  );
}
