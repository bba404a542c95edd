import { flexRender, type Header, type Row, type Table } from "@tanstack/react-table";
import type { HTMLAttributes, ReactNode } from "react";

/**
 * What one table adds to the shared classes (its spacing, text size, frame and hover); the
 * structure, roles and names are the same for all.
 */
export type DataTableLook = {
  /** The scrolling box around the table. */
  frame?: string;
  table?: string;
  head?: string;
  headerCell?: string;
  sortButton?: string;
  sortGlyph?: string;
  row?: string;
  /** One class list for every cell, or one per column id. */
  cell?: string | ((columnId: string) => string);
  empty?: string;
};

const withShared = (shared: string, own: string | undefined) => (own ? `${shared} ${own}` : shared);

/**
 * A TanStack table drawn as a captioned `<table>`: sortable headers are buttons, the header cell
 * carries aria-sort, and `empty` (when given) is a last row across all columns. It reads the table's
 * state on every render of its parent, so do not wrap it in memo (the table object keeps its identity).
 */
export function DataTable<TData>({
  table,
  caption,
  look = {},
  empty,
  sayOrder = true,
  rowAttributes,
}: {
  table: Table<TData>;
  caption: string;
  look?: DataTableLook;
  /** The text of a row shown when there is nothing to list; false or absent draws no such row. */
  empty?: ReactNode;
  /** Whether a sort button's name also says the order (", sorted ascending"); aria-sort says it either way. */
  sayOrder?: boolean;
  rowAttributes?: (row: Row<TData>) => HTMLAttributes<HTMLTableRowElement>;
}) {
  return (
    <div className={withShared("overflow-x-auto", look.frame)}>
      <table className={withShared("w-full text-left", look.table)}>
        <caption className="sr-only">{caption}</caption>
        <thead className={withShared("border-b border-paper-edge", look.head)}>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <SortableHeaderCell key={header.id} header={header} look={look} sayOrder={sayOrder} />
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className={withShared("border-b border-paper-edge last:border-b-0", look.row)} {...rowAttributes?.(row)}>
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={typeof look.cell === "function" ? look.cell(cell.column.id) : look.cell}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
          {empty ? (
            <tr>
              <td colSpan={table.getVisibleLeafColumns().length} className={withShared("text-ink-muted", look.empty)}>
                {empty}
              </td>
            </tr>
          ) : null}
        </tbody>
      </table>
    </div>
  );
}

function SortableHeaderCell<TData>({ header, look, sayOrder }: { header: Header<TData, unknown>; look: DataTableLook; sayOrder: boolean }) {
  const sorted = header.column.getIsSorted();
  const label = flexRender(header.column.columnDef.header, header.getContext());
  return (
    <th scope="col" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined} className={withShared("font-medium", look.headerCell)}>
      {header.column.getCanSort() ? (
        <button type="button" onClick={header.column.getToggleSortingHandler()} className={withShared("inline-flex items-center", look.sortButton)}>
          {label}
          <span aria-hidden="true" className={look.sortGlyph}>
            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
          </span>
          {sayOrder && <span className="sr-only">{sorted ? `, sorted ${sorted === "asc" ? "ascending" : "descending"}` : ", not sorted"}</span>}
        </button>
      ) : (
        label
      )}
    </th>
  );
}
