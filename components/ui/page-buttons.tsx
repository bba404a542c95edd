import type { Table } from "@tanstack/react-table";
import { Button } from "@/components/ui/button";

/**
 * The two page buttons of a TanStack table with "Page x of y" between them. The caller draws the
 * box around them (a named nav, or a plain row) and decides when there is more than one page to show.
 */
export function PageButtons<TData>({
  table,
  previousText = "Previous page",
  nextText = "Next page",
  buttonClassName = "",
  countSuffix = "",
}: {
  table: Table<TData>;
  previousText?: string;
  nextText?: string;
  buttonClassName?: string;
  /** Said after the page count, e.g. " (21 rows)". */
  countSuffix?: string;
}) {
  return (
    <>
      <Button tone="quiet" className={buttonClassName} onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
        {previousText}
      </Button>
      <span>
        Page {table.getState().pagination.pageIndex + 1} of {table.getPageCount()}
        {countSuffix}
      </span>
      <Button tone="quiet" className={buttonClassName} onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
        {nextText}
      </Button>
    </>
  );
}
