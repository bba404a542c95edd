"use client";

import {
  createColumnHelper,
  flexRender,
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
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
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

      <div className="overflow-x-auto rounded-lg border border-paper-edge bg-white/60">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Notebooks you can open, {total} in all</caption>
          <thead className="border-b border-paper-edge bg-paper-deep">
            {table.getHeaderGroups().map((headerGroup) => (
              <tr key={headerGroup.id}>
                {headerGroup.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const label = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                      className="whitespace-nowrap px-4 py-2 font-medium text-ink-soft"
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 rounded hover:text-ink"
                        >
                          {label}
                          <span aria-hidden="true" className="w-3 text-xs">
                            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                          </span>
                          <span className="sr-only">
                            {sorted ? `, sorted ${sorted === "asc" ? "ascending" : "descending"}` : ", not sorted"}
                          </span>
                        </button>
                      ) : (
                        label
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-paper-edge last:border-b-0 hover:bg-paper-deep/60">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={`px-4 py-3 align-top ${cell.column.id === "title" ? "" : "whitespace-nowrap"}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {!isPending && table.getRowModel().rows.length === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-4 py-8 text-center text-ink-muted">
                  {q ? `No notebook title contains “${q}”.` : "No notebooks yet."}
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>

      <nav aria-label="Notebook pages" className="flex flex-wrap items-center justify-between gap-3 text-sm">
        <SelectField
          label="Notebooks per page"
          className="flex-row items-center gap-2"
          value={String(pagination.pageSize)}
          onChange={(event) => setPagination({ pageIndex: 0, pageSize: Number(event.target.value) })}
          options={pageSizes.map((size) => ({ value: String(size), label: String(size) }))}
        />
        <div className="flex items-center gap-3">
          <Button tone="quiet" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
            Previous page
          </Button>
          <span>
            Page {pagination.pageIndex + 1} of {pageCount}
          </span>
          <Button tone="quiet" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
            Next page
          </Button>
        </div>
      </nav>
    </div>
  );
}
