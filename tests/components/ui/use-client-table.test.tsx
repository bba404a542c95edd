import { describe, expect, it } from "vitest";
import { columnFilterText } from "@/components/ui/use-client-table";
import { renderTable } from "./table-fixture";

describe("useClientTable", () => {
  it("sorts, filters and pages from the initial state", () => {
    const names = renderTable((table) => table.getRowModel().rows.map((row) => row.original.name).join(", "), {
      initialSort: [{ id: "name", desc: true }],
      initialFilters: [{ id: "kind", value: "star" }],
      pageSize: 2,
    });
    expect(names).toBe("Vesper-3, Lantern");
  });

  it("reads a column's filter text, and the empty text where there is none", () => {
    const read = renderTable((table) => `${columnFilterText(table, "kind")}|${columnFilterText(table, "name")}`, { initialFilters: [{ id: "kind", value: "planet" }] });
    expect(read).toBe("planet|");
  });

  // Bug 6a218d5: TanStack's reset of the page on every new `data` identity re-rendered the notebook page without end.
  it("never lets TanStack reset the page by itself", () => {
    expect(renderTable((table) => String(table.options.autoResetPageIndex))).toBe("false");
  });
});
