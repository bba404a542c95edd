"use client";

import { createColumnHelper } from "@tanstack/react-table";
import { useMemo } from "react";
import { DataTable, type DataTableLook } from "@/components/ui/data-table";
import { PageButtons } from "@/components/ui/page-buttons";
import { SelectField } from "@/components/ui/select-field";
import { columnFilterText, setColumnFilterText, useClientTable } from "@/components/ui/use-client-table";

/** One thread as a row of the side list. */
export type RemarkRow = {
  id: string;
  /** Step number for sorting by place in the text; text-only spans sort last. */
  order: number;
  where: string;
  excerpt: string;
  authorId: string;
  authorName: string;
  status: "open" | "settled";
  replies: number;
  updatedAt: string;
};

const column = createColumnHelper<RemarkRow>();
const shortTime = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

const PAGE_SIZE = 8;
const look: DataTableLook = {
  frame: "rounded border border-paper-edge bg-white/60",
  table: "text-xs",
  head: "bg-paper-deep text-ink-soft",
  headerCell: "whitespace-nowrap px-2 py-1.5",
  sortButton: "gap-0.5 hover:text-ink",
  row: "align-top aria-selected:bg-accent-wash",
  cell: "px-2 py-1.5",
  empty: "px-2 py-4 text-center",
};

/**
 * The side list of remark threads: filter by open/settled and by who started a thread,
 * sort by place in the text, author, status or last activity, eight to a page. All in the
 * browser: a notebook has tens of threads, not thousands.
 */
export function RemarksTable({ rows, selectedId, onOpen }: { rows: RemarkRow[]; selectedId: string | null; onOpen: (id: string) => void }) {
  const columns = useMemo(
    () => [
      column.accessor("order", {
        id: "where",
        header: "Where",
        cell: (info) => info.row.original.where,
      }),
      column.accessor("excerpt", {
        id: "remark",
        header: "Remark",
        enableSorting: false,
        cell: (info) => (
          <button type="button" onClick={() => onOpen(info.row.original.id)} className="text-left underline-offset-2 hover:underline">
            {info.getValue()}
            <span className="sr-only">, open the thread</span>
            {info.row.original.replies > 0 ? <span className="block text-xs text-ink-muted">{info.row.original.replies} repl{info.row.original.replies === 1 ? "y" : "ies"}</span> : null}
          </button>
        ),
      }),
      column.accessor("authorName", { id: "author", header: "By", filterFn: (row, _id, value: string) => !value || row.original.authorId === value }),
      column.accessor("status", { id: "status", header: "Status", filterFn: (row, _id, value: string) => !value || value === "all" || row.original.status === value }),
      column.accessor("updatedAt", {
        id: "updatedAt",
        header: "Last activity",
        cell: (info) => <time dateTime={info.getValue()}>{shortTime.format(new Date(info.getValue()))}</time>,
      }),
    ],
    [onOpen],
  );

  const table = useClientTable({
    data: rows,
    columns,
    initialSort: [{ id: "where", desc: false }],
    initialFilters: [{ id: "status", value: "open" }],
    pageSize: PAGE_SIZE,
  });

  const authors = [...new Map(rows.map((row) => [row.authorId, row.authorName])).entries()].sort((a, b) => a[1].localeCompare(b[1]));
  const shown = table.getFilteredRowModel().rows.length;

  return (
    <div className="space-y-2">
      <div className="grid grid-cols-2 gap-2">
        <SelectField
          label="Show"
          value={columnFilterText(table, "status") || "all"}
          onChange={(event) => setColumnFilterText(table, "status", event.target.value)}
          options={[
            { value: "open", label: "open remarks" },
            { value: "settled", label: "settled remarks" },
            { value: "all", label: "all remarks" },
          ]}
        />
        <SelectField
          label="Started by"
          value={columnFilterText(table, "author")}
          onChange={(event) => setColumnFilterText(table, "author", event.target.value)}
          options={[{ value: "", label: "anyone" }, ...authors.map(([id, name]) => ({ value: id, label: name }))]}
        />
      </div>
      <p role="status" className="text-xs text-ink-muted">
        {shown} thread{shown === 1 ? "" : "s"} shown of {rows.length}
      </p>
      <DataTable
        table={table}
        caption="Remark threads on this notebook"
        look={look}
        empty={shown === 0 && (rows.length === 0 ? "No remarks yet." : "No thread matches these filters.")}
        rowAttributes={(row) => ({ "aria-selected": row.original.id === selectedId })}
      />
      {table.getPageCount() > 1 && (
        <nav aria-label="Remark pages" className="flex items-center justify-between text-xs">
          <PageButtons table={table} buttonClassName="px-2 py-1 text-xs" />
        </nav>
      )}
    </div>
  );
}
