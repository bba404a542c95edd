"use client";

import type { CoAuthor } from "@/editor/collaboration";

const statusWord: Record<NonNullable<CoAuthor["status"]>, string> = { active: "here", idle: "idle", away: "away" };

/** Who else has this notebook open, with the colour of their caret and whether they are here, idle or away. */
export function CoAuthorList({ coAuthors }: { coAuthors: readonly (CoAuthor & { clientId: number })[] }) {
  if (coAuthors.length === 0) return <p className="font-sans text-xs text-ink-muted">No one else has this notebook open.</p>;
  return (
    <ul aria-label="Also here" className="flex flex-wrap gap-2 font-sans text-xs">
      {coAuthors.map((person) => (
        <li key={person.clientId} className="flex items-center gap-1 rounded-full border border-paper-edge px-2 py-0.5">
          <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-sm" style={{ background: person.color }} />
          <span>{person.name}</span>
          <span className="text-ink-muted">({statusWord[person.status ?? "active"]})</span>
        </li>
      ))}
    </ul>
  );
}
