"use client";

import { useQuery } from "@tanstack/react-query";
import { useId, useState } from "react";
import { fetchJson } from "@/components/data/api-client";
import { useDebouncedValue } from "@/components/data/use-debounced-value";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

type MailroomMessage = { id: string; kind: string; from: string; to: string[]; subject: string; text: string; createdAt: string };

const timeFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "medium" });

/** The mailroom's list: newest first, narrowed to one recipient, each message opened in place. */
export function MailroomView() {
  const filterId = useId();
  const [recipient, setRecipient] = useState("");
  const to = useDebouncedValue(recipient.trim(), 250);
  const messages = useQuery({
    queryKey: ["mailroom", to],
    queryFn: async () => (await fetchJson<{ messages: MailroomMessage[] }>(`/api/mailroom?${new URLSearchParams(to ? { to } : {})}`)).messages,
  });

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={filterId} className="text-sm font-medium">
            Recipient’s address
          </label>
          <input
            id={filterId}
            type="search"
            value={recipient}
            onChange={(event) => setRecipient(event.target.value)}
            placeholder="reviewer@vierbein.test"
            className="w-72 rounded-md border border-paper-edge bg-white/70 px-3 py-2"
          />
        </div>
        <div className="flex items-center gap-3">
          <p role="status" className="text-sm text-ink-muted">
            {messages.isPending ? "Loading…" : `${messages.data?.length ?? 0} message${messages.data?.length === 1 ? "" : "s"}`}
          </p>
          <Button tone="quiet" onClick={() => void messages.refetch()}>
            Check again
          </Button>
        </div>
      </div>
      {messages.isError && <Notice kind="problem">{messages.error.message}</Notice>}
      <ol aria-label="Messages" className="space-y-2">
        {messages.data?.map((message) => (
          <li key={message.id} className="rounded-lg border border-paper-edge bg-white/60">
            <details>
              <summary className="cursor-pointer px-4 py-3">
                <span className="font-medium">{message.subject}</span>
                <span className="block text-sm text-ink-soft">
                  to {message.to.join(", ")} · {message.kind} · <time dateTime={message.createdAt}>{timeFormat.format(new Date(message.createdAt))}</time>
                </span>
              </summary>
              <div className="border-t border-paper-edge px-4 py-3">
                <p className="mb-2 text-xs text-ink-muted">From {message.from}</p>
                {/* Plain text only: links become clickable, nothing else is interpreted. */}
                <pre className="whitespace-pre-wrap break-words font-sans text-sm">{linkify(message.text)}</pre>
              </div>
            </details>
          </li>
        ))}
      </ol>
      {messages.isSuccess && messages.data.length === 0 && <p className="text-sm text-ink-muted">{to ? `Nothing was sent to ${to}.` : "Nothing was sent yet."}</p>}
    </div>
  );
}

function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, index) =>
    index % 2 === 1 ? (
      <a key={index} href={part}>
        {part}
      </a>
    ) : (
      part
    ),
  );
}
