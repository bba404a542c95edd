"use client";

import {
  createColumnHelper,
  getCoreRowModel,
  useReactTable,
  type PaginationState,
  type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { useId, useMemo, useState } from "react";
import { useNotebookPage } from "@/components/data/queries";
import { roleLabel } from "@/components/data/roles";
import type { NotebookRow, NotebookSortKey } from "@/components/data/types";
import { useDebouncedValue } from "@/components/data/use-debounced-value";
import { DataTable, type DataTableLook } from "@/components/ui/data-table";
import { Notice } from "@/components/ui/notice";
import { PageButtons } from "@/components/ui/page-buttons";
import { SelectField } from "@/components/ui/select-field";

const column = createColumnHelper<NotebookRow>();
const dateFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" });

// Sorting, filtering and paging all happen on the server; the table only holds the state and draws one page.
const columns = [
  column.accessor("title", {
    id: "title",
    header: "Title",
    cell: (info) => (
      <Link href={`/notebooks/${info.row.original.id}`} className="font-serif text-base font-semibold">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("groupName", { id: "group", header: "Group" }),
  column.accessor("role", { id: "role", header: "Your role", enableSorting: false, cell: (info) => roleLabel(info.getValue()) }),
  column.accessor("updatedAt", {
    id: "updatedAt",
    header: "Last changed",
    cell: (info) => <time dateTime={info.getValue()}>{dateFormat.format(new Date(info.getValue()))}</time>,
  }),
];

const pageSizes = [10, 20, 50];
const look: DataTableLook = {
  frame: "rounded-lg border border-paper-edge bg-white/60",
  table: "border-collapse text-sm",
  head: "bg-paper-deep",
  headerCell: "whitespace-nowrap px-4 py-2 text-ink-soft",
  sortButton: "gap-1 rounded hover:text-ink",
  sortGlyph: "w-3 text-xs",
  row: "hover:bg-paper-deep/60",
  cell: (columnId) => `px-4 py-3 align-top ${columnId === "title" ? "" : "whitespace-nowrap"}`,
  empty: "px-4 py-8 text-center",
};

export function NotebooksTable() {
  const filterId = useId();
  const [filter, setFilter] = useState("");
  const [sorting, setSorting] = useState<SortingState>([{ id: "updatedAt", desc: true }]);
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize: 10 });
  const q = useDebouncedValue(filter.trim(), 250);

  const sort = sorting[0];
  const query = useMemo(
    () => ({
      q,
      sort: (sort?.id ?? "updatedAt") as NotebookSortKey,
      dir: sort?.desc ? ("desc" as const) : ("asc" as const),
      page: pagination.pageIndex + 1,
      pageSize: pagination.pageSize,
    }),
    [q, sort, pagination],
  );
  const { data, isPending, isError, error, isFetching } = useNotebookPage(query);
  const total = data?.total ?? 0;
  const pageCount = Math.max(1, Math.ceil(total / pagination.pageSize));

  const table = useReactTable({
    data: data?.items ?? [],
    columns,
    state: { sorting, pagination },
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableSortingRemoval: false,
    pageCount,
    onSortingChange: (updater) => {
      setSorting(updater);
      setPagination((current) => ({ ...current, pageIndex: 0 }));
    },
    onPaginationChange: setPagination,
    getCoreRowModel: getCoreRowModel(),
  });

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={filterId} className="text-sm font-medium">
            Filter notebooks by title
          </label>
          <input
            id={filterId}
            type="search"
            value={filter}
            onChange={(event) => {
              setFilter(event.target.value);
              setPagination((current) => ({ ...current, pageIndex: 0 }));
            }}
            placeholder="e.g. orbit"
            className="w-64 rounded-md border border-paper-edge bg-white/70 px-3 py-2"
          />
        </div>
        <p role="status" className="text-sm text-ink-muted">
          {isPending ? "Loading notebooks…" : isFetching ? "Updating…" : `${total} notebook${total === 1 ? "" : "s"}`}
        </p>
      </div>

      {isError && <Notice kind="problem">{error.message}</Notice>}

      <DataTable
        table={table}
        caption={`Notebooks you can open, ${total} in all`}
        look={look}
        empty={!isPending && table.getRowModel().rows.length === 0 && (q ? `No notebook title contains “${q}”.` : "No notebooks yet.")}
      />

      <nav aria-label="Notebook pages" className="flex flex-wrap items-center justify-between gap-3 text-sm">
        <SelectField
          label="Notebooks per page"
          className="flex-row items-center gap-2"
          value={String(pagination.pageSize)}
          onChange={(event) => setPagination({ pageIndex: 0, pageSize: Number(event.target.value) })}
          options={pageSizes.map((size) => ({ value: String(size), label: String(size) }))}
        />
        <div className="flex items-center gap-3">
          <PageButtons table={table} />
        </div>
      </nav>
    </div>
  );
}
