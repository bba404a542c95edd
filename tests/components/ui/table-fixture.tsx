import { createColumnHelper, type ColumnFiltersState, type SortingState, type Table } from "@tanstack/react-table";
import { renderToStaticMarkup } from "react-dom/server";
import type { ReactNode } from "react";
import { useClientTable } from "@/components/ui/use-client-table";

/** Orbiting objects of the demo group, as rows for the table tests. */
export type Body = { id: string; name: string; kind: "star" | "planet"; mass: number };

export const bodies: Body[] = ["Kestrel-7", "Vesper-3", "Lantern", "Kestrel-7b", "Vesper-3a"].map((name, index) => ({
  id: `b${index}`,
  name,
  kind: index < 3 ? "star" : "planet",
  mass: index + 1,
}));

const column = createColumnHelper<Body>();
export const bodyColumns = [
  column.accessor("name", { header: "Name" }),
  column.accessor("kind", { header: "Kind", filterFn: "equalsString" }),
  column.accessor("mass", { header: "Mass", enableSorting: false }),
];

/** Static markup of whatever `draw` makes of a client table over `data`. */
export function renderTable(
  draw: (table: Table<Body>) => ReactNode,
  options: { data?: Body[]; initialSort?: SortingState; initialFilters?: ColumnFiltersState; pageSize?: number } = {},
): string {
  function Harness() {
    const table = useClientTable({
      data: options.data ?? bodies,
      columns: bodyColumns,
      initialSort: options.initialSort ?? [{ id: "name", desc: false }],
      initialFilters: options.initialFilters,
      pageSize: options.pageSize ?? 10,
    });
    return <>{draw(table)}</>;
  }
  return renderToStaticMarkup(<Harness />);
}
