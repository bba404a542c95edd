"use client";

import { Button } from "@/components/ui/button";
import { RemarkForm } from "./remark-form";
import type { RemarkThread } from "./use-remarks";

const timeFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" });

/** One thread opened from the side list: where it points, the remark, its replies, and what you may do with it. */
export function RemarkThreadView({
  thread,
  where,
  anchorFound,
  canReply,
  canSettle,
  onShow,
  onReply,
  onSettle,
  onClose,
  busy,
  problem,
}: {
  thread: RemarkThread;
  where: string;
  /** False when the remarked text was deleted since. */
  anchorFound: boolean;
  canReply: boolean;
  canSettle: boolean;
  onShow: () => void;
  onReply: (body: string) => Promise<unknown>;
  onSettle: (settle: boolean) => void;
  onClose: () => void;
  busy: boolean;
  problem: string | null;
}) {
  const who = (person: RemarkThread["author"]) => person?.name || person?.email || "a former member";
  return (
    <article aria-label={`Remark thread on ${where}`} className="space-y-3 rounded-md border border-paper-edge bg-paper p-3">
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <p className="text-sm font-medium">On {where}</p>
          {thread.anchor.quote ? <blockquote className="mt-1 border-l-2 border-paper-edge pl-2 font-mono text-xs text-ink-soft">{thread.anchor.quote}</blockquote> : null}
          {!anchorFound ? <p className="mt-1 text-xs text-alarm">The remarked text has since been deleted.</p> : null}
        </div>
        <div className="flex gap-2">
          {anchorFound ? (
            <Button tone="quiet" className="px-2 py-1 text-xs" onClick={onShow}>
              Show in the text
            </Button>
          ) : null}
          <Button tone="quiet" className="px-2 py-1 text-xs" onClick={onClose}>
            Close thread
          </Button>
        </div>
      </header>

      <ol className="space-y-2" aria-label="Remark and replies">
        {[{ id: thread.id, body: thread.body, author: thread.author, createdAt: thread.createdAt }, ...thread.replies].map((entry) => (
          <li key={entry.id} className="rounded bg-white/70 px-2 py-1.5 text-sm">
            <p className="text-xs text-ink-muted">
              {who(entry.author)} · <time dateTime={entry.createdAt}>{timeFormat.format(new Date(entry.createdAt))}</time>
            </p>
            <p className="whitespace-pre-wrap">{entry.body}</p>
          </li>
        ))}
      </ol>

      <p role="status" className="text-sm">
        {thread.settled ? (
          <>
            <strong>Settled</strong>
            {thread.settledBy ? ` by ${who(thread.settledBy)}` : ""}
            {thread.settledAt ? ` on ${timeFormat.format(new Date(thread.settledAt))}` : ""}.
          </>
        ) : (
          <strong>Open</strong>
        )}
      </p>

      {problem && (
        <p role="alert" className="text-sm text-alarm">
          Problem: {problem}
        </p>
      )}
      {canSettle ? (
        <Button tone={thread.settled ? "quiet" : "primary"} className="px-3 py-1" disabled={busy} onClick={() => onSettle(!thread.settled)}>
          {thread.settled ? "Reopen" : "Settle"}
        </Button>
      ) : null}
      {canReply ? <RemarkForm label="Your reply" formLabel="Reply to the remark" submitLabel="Reply" onSubmit={onReply} /> : null}
    </article>
  );
}
