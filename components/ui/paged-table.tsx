"use client";

import type { ColumnDef, ColumnFiltersState, SortingState } from "@tanstack/react-table";
import { useId, useState, type ReactNode } from "react";
import { DataTable, type DataTableLook } from "@/components/ui/data-table";
import { PageButtons } from "@/components/ui/page-buttons";
import { useClientTable } from "@/components/ui/use-client-table";

const look: DataTableLook = {
  table: "text-sm",
  head: "text-ink-soft",
  headerCell: "py-1.5 pr-3",
  sortButton: "gap-1",
  row: "align-top",
  cell: "py-1.5 pr-3",
  empty: "py-3",
};

/**
 * A table over a list already in the browser (a notebook's checkpoints or editions are few):
 * sortable by header, filtered by free text and by the `filters` the caller draws, paged.
 */
export function PagedTable<Row>({
  caption,
  data,
  columns,
  initialSort,
  searchLabel,
  filters,
  columnFilters,
  emptyText,
  pageSize = 8,
}: {
  caption: string;
  data: Row[];
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- TanStack's column values are heterogeneous
  columns: ColumnDef<Row, any>[];
  initialSort: SortingState;
  searchLabel: string;
  filters?: ReactNode;
  columnFilters?: ColumnFiltersState;
  emptyText: string;
  pageSize?: number;
}) {
  const searchId = useId();
  const table = useClientTable({ data, columns, initialSort, initialFilters: columnFilters, pageSize, sortingRemoval: true });
  // The caller owns its filters; when they change, hand them to the table, which goes back to the
  // first page (adjusting state while rendering, not in an effect, so no frame shows an empty later page).
  const filterKey = JSON.stringify(columnFilters ?? []);
  const [seenFilterKey, setSeenFilterKey] = useState(filterKey);
  if (filterKey !== seenFilterKey) {
    setSeenFilterKey(filterKey);
    table.setColumnFilters(columnFilters ?? []);
  }
  const total = table.getFilteredRowModel().rows.length;

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={searchId} className="text-xs font-medium text-ink-soft">
            {searchLabel}
          </label>
          <input
            id={searchId}
            type="search"
            value={table.getState().globalFilter as string}
            onChange={(event) => table.setGlobalFilter(event.target.value)}
            className="rounded-md border border-paper-edge bg-white/70 px-2 py-1 text-sm"
          />
        </div>
        {filters}
      </div>
      <DataTable table={table} caption={caption} look={look} empty={table.getRowModel().rows.length === 0 && emptyText} sayOrder={false} />
      {total > table.getState().pagination.pageSize && (
        <div className="flex items-center gap-2 text-xs">
          <PageButtons table={table} previousText="Earlier page" nextText="Later page" buttonClassName="!px-2 !py-1" countSuffix={` (${total} rows)`} />
        </div>
      )}
    </div>
  );
}
