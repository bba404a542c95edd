import { describe, expect, it } from "vitest";
import { DataTable } from "@/components/ui/data-table";
import { renderTable } from "./table-fixture";

const headerCell = (html: string, name: string) => html.match(new RegExp(`<th[^>]*>(?:(?!</th>).)*${name}(?:(?!</th>).)*</th>`))?.[0] ?? "";

describe("DataTable", () => {
  const html = renderTable((table) => <DataTable table={table} caption="Bodies of the group" empty={false} />);

  it("names the table by its caption", () => {
    expect(html).toContain('<caption class="sr-only">Bodies of the group</caption>');
  });

  it("marks the sorted column with aria-sort and says the order in the sort button's name", () => {
    expect(headerCell(html, "Name")).toContain('aria-sort="ascending"');
    expect(headerCell(html, "Name")).toMatch(/<button type="button"[^>]*>Name<span aria-hidden="true">▲<\/span><span class="sr-only">, sorted ascending<\/span><\/button>/);
    expect(headerCell(html, "Kind")).not.toContain("aria-sort");
    expect(headerCell(html, "Kind")).toContain(", not sorted");
  });

  it("draws a header that cannot sort as plain text, without a button", () => {
    expect(headerCell(html, "Mass")).not.toContain("<button");
  });

  it("leaves the order out of the button's name when asked (aria-sort still says it)", () => {
    const quiet = renderTable((table) => <DataTable table={table} caption="Bodies" sayOrder={false} />, { initialSort: [{ id: "name", desc: true }] });
    expect(quiet).not.toContain("sr-only\">, ");
    expect(headerCell(quiet, "Name")).toContain('aria-sort="descending"');
  });

  it("draws one row per item and the empty row across every column only when given", () => {
    expect(html.match(/<tr/g)).toHaveLength(1 + 5);
    const none = renderTable((table) => <DataTable table={table} caption="Bodies" empty="Nothing to list." />, { data: [] });
    expect(none).toContain('<td colSpan="3" class="text-ink-muted">Nothing to list.</td>');
  });

  it("passes each row's attributes on, e.g. which row is selected", () => {
    const selected = renderTable((table) => <DataTable table={table} caption="Bodies" rowAttributes={(row) => ({ "aria-selected": row.original.name === "Lantern" })} />);
    expect(selected.match(/aria-selected="true"/g)).toHaveLength(1);
    expect(selected.match(/aria-selected="false"/g)).toHaveLength(4);
  });
});
