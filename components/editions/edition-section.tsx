"use client";

import { useQuery } from "@tanstack/react-query";
import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { useId, useMemo, useState } from "react";
import { fetchJson } from "@/components/data/api-client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { PagedTable } from "@/components/ui/paged-table";
import { PublishForm } from "./publish-form";

type EditionRow = { number: number; title: string; sha256: string; reason: string | null; publishedByName: string | null; publishedAt: string; tally: Record<string, number>; url: string };

const dateFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium" });
const column = createColumnHelper<EditionRow>();
const columns = [
  column.accessor("number", {
    header: "Edition",
    cell: (info) => (
      <Link href={new URL(info.row.original.url).pathname}>
        Edition {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("publishedAt", { header: "Published", sortingFn: "datetime", cell: (info) => <time dateTime={info.getValue()}>{dateFormat.format(new Date(info.getValue()))}</time> }),
  column.accessor((row) => row.publishedByName ?? "", { id: "by", header: "By" }),
  column.accessor((row) => `${row.tally.verified ?? 0} verified, ${row.tally.undecided ?? 0} undecided, ${row.tally.refuted ?? 0} refuted`, { id: "ledger", header: "Check ledger", enableSorting: false }),
  column.accessor((row) => row.sha256.slice(0, 12), { id: "sha", header: "SHA-256", enableSorting: false, cell: (info) => <code title={info.row.original.sha256}>{info.getValue()}…</code> }),
];

/** A notebook's published editions, and the lead's way to publish the next. */
export function EditionSection({ notebookId, canPublish }: { notebookId: string; canPublish: boolean }) {
  const titleId = useId();
  const [publishing, setPublishing] = useState(false);
  const list = useQuery({ queryKey: ["editions", notebookId], queryFn: () => fetchJson<{ editions: EditionRow[] }>(`/api/notebooks/${notebookId}/editions`) });
  const editions = useMemo(() => list.data?.editions ?? [], [list.data]);
  return (
    <section aria-labelledby={titleId} className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id={titleId} className="font-serif text-xl font-semibold">
          Editions
        </h2>
        {canPublish && !publishing && <Button onClick={() => setPublishing(true)}>Publish an edition…</Button>}
      </div>
      {publishing && <PublishForm notebookId={notebookId} onClose={() => setPublishing(false)} />}
      {list.isError ? (
        <Notice kind="problem">{list.error.message}</Notice>
      ) : (
        <PagedTable
          caption="Published editions of this notebook"
          data={editions}
          columns={columns}
          initialSort={[{ id: "number", desc: true }]}
          searchLabel="Find an edition"
          emptyText={list.isPending ? "Loading…" : "Nothing published yet."}
        />
      )}
    </section>
  );
}
