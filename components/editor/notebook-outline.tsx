"use client";

import { memo, useRef } from "react";
import type { Editor } from "@tiptap/core";
import { renderLatex } from "@/editor/katex-render";
import type { OutlineEntry } from "@/editor/outline";
import { useNearViewport } from "./use-near-viewport";
import { VerdictShape } from "./verdict-mark";

const verdictTone: Record<string, string> = { verified: "text-accent", refuted: "text-alarm", undecided: "text-[#7a5a12]" };

// The outline re-renders on every transaction; a step's rendering only changes with its source.
const renderedRelations = new Map<string, string>();
function relationHtml(latex: string): string {
  let html = renderedRelations.get(latex);
  if (html === undefined) {
    html = renderLatex(latex, false, { visualOnly: true }).html;
    if (renderedRelations.size > 2000) renderedRelations.clear();
    renderedRelations.set(latex, html);
  }
  return html;
}

/** Entries within about half a screen of the outline's visible part show KaTeX. */
const OUTLINE_NEAR_MARGIN = "400px 0px";

/**
 * A step's relation in one line: KaTeX near the visible part of the outline, its LaTeX source
 * further away. KaTeX lays out each symbol as its own positioned box, so 300 rendered entries
 * were two thirds of a long notebook's page and cost compositing time in every frame, typing
 * included; the far ones now cost a line of text until they are scrolled near.
 */
function OutlineRelation({ latex }: { latex: string }) {
  const box = useRef<HTMLSpanElement>(null);
  const near = useNearViewport(box, OUTLINE_NEAR_MARGIN);
  return near ? (
    <span ref={box} aria-hidden="true" className="outline-relation min-w-0 flex-1 overflow-hidden whitespace-nowrap text-xs text-ink-muted" dangerouslySetInnerHTML={{ __html: relationHtml(latex) }} />
  ) : (
    <span ref={box} aria-hidden="true" className="outline-relation min-w-0 flex-1 overflow-hidden whitespace-nowrap font-mono text-xs text-ink-muted">
      {latex}
    </span>
  );
}

/**
 * React keys by identity, not position: typing shifts the positions of every later block, and
 * position keys made React rebuild all their items (KaTeX and all) on each keystroke. Steps
 * have ids; sections and blocks are keyed by their order among their kind.
 */
function outlineKeys(entries: readonly OutlineEntry[]): string[] {
  const seen = { section: 0, spacetime: 0 };
  return entries.map((entry) => (entry.kind === "step" ? entry.id : `${entry.kind}-${seen[entry.kind]++}`));
}

/** Moves the caret to a block and scrolls it into the middle of the view. */
export function jumpTo(editor: Editor, pos: number): void {
  editor.chain().setTextSelection(pos + 1).focus(undefined, { scrollIntoView: false }).run();
  const dom = editor.view.nodeDOM(pos);
  if (dom instanceof HTMLElement) dom.scrollIntoView({ block: "center" });
}

/**
 * Sections, spacetime blocks and steps of the notebook, each a link that jumps there. Memoised:
 * it changes with the outline entries, not with the page's link state or summary line.
 */
export const NotebookOutline = memo(function NotebookOutline({ editor, entries }: { editor: Editor; entries: readonly OutlineEntry[] }) {
  if (!entries.length) return <p className="font-sans text-sm text-ink-muted">Headings and steps will be listed here.</p>;
  const keys = outlineKeys(entries);
  return (
    <ol className="space-y-0.5 font-sans text-sm">
      {entries.map((entry, index) => (
        <li key={keys[index]} className="outline-entry">
          <button
            type="button"
            aria-label={entry.kind === "step" ? `(${entry.number}) ${entry.verdict}: ${entry.relation}` : undefined}
            onClick={() => jumpTo(editor, entry.pos)}
            className={`flex w-full items-center gap-1.5 rounded px-1.5 py-0.5 text-left hover:bg-paper-deep ${
              entry.kind === "section" ? (entry.level === 2 ? "mt-2 font-semibold text-ink" : "mt-1 pl-3 font-medium text-ink-soft") : "pl-4 text-ink-soft"
            }`}
          >
            {entry.kind === "step" ? (
              <>
                <VerdictShape word={entry.verdict} className={verdictTone[entry.verdict] ?? "text-ink-muted"} />
                <span className="tabular-nums">({entry.number})</span>
                <OutlineRelation latex={entry.relation} />
              </>
            ) : entry.kind === "spacetime" ? (
              <span className="text-accent">◆ {entry.name || "Spacetime block"}</span>
            ) : (
              <span className="truncate">{entry.text || "Untitled section"}</span>
            )}
          </button>
        </li>
      ))}
    </ol>
  );
});
