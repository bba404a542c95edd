import {
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type ColumnFiltersState,
  type PaginationState,
  type SortingState,
  type Table,
} from "@tanstack/react-table";
import { useState } from "react";

/**
 * A TanStack table over rows that are all in the browser: sorted by header, filtered per column
 * and by free text (`table.setGlobalFilter`), paged. Only a change of filter goes back to the
 * first page. Callers pass memoised `data`.
 */
export function useClientTable<Row>({
  data,
  columns,
  initialSort,
  initialFilters = [],
  pageSize,
  sortingRemoval = false,
}: {
  data: Row[];
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- TanStack's column values are heterogeneous
  columns: ColumnDef<Row, any>[];
  initialSort: SortingState;
  initialFilters?: ColumnFiltersState;
  pageSize: number;
  /** Whether a further click on a sorted header drops the sort again (TanStack's default cycle). */
  sortingRemoval?: boolean;
}): Table<Row> {
  const [sorting, setSorting] = useState<SortingState>(initialSort);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>(initialFilters);
  const [globalFilter, setGlobalFilter] = useState("");
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize });
  const toFirstPage = () => setPagination((current) => ({ ...current, pageIndex: 0 }));

  return useReactTable({
    data,
    columns,
    state: { sorting, columnFilters, globalFilter, pagination },
    onSortingChange: setSorting,
    onColumnFiltersChange: (updater) => {
      setColumnFilters(updater);
      toFirstPage();
    },
    onGlobalFilterChange: (updater) => {
      setGlobalFilter(updater);
      toFirstPage();
    },
    onPaginationChange: setPagination,
    globalFilterFn: "includesString",
    enableSortingRemoval: sortingRemoval,
    // TanStack's own reset fires whenever `data` changes identity; a caller that rebuilt its rows on
    // every render would then reset, re-render and reset again without end (it starved the notebook
    // page in production). The resets above are the ones a reader expects.
    autoResetPageIndex: false,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
  });
}

/** The text a column is filtered by, or "" when it is not filtered. */
export function columnFilterText<Row>(table: Table<Row>, columnId: string): string {
  return (table.getColumn(columnId)?.getFilterValue() as string | undefined) ?? "";
}

/** Filter a column by a text; the empty text removes the filter. */
export function setColumnFilterText<Row>(table: Table<Row>, columnId: string, value: string): void {
  table.getColumn(columnId)?.setFilterValue(value || undefined);
}
