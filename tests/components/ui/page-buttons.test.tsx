import { describe, expect, it } from "vitest";
import { PageButtons } from "@/components/ui/page-buttons";
import { renderTable } from "./table-fixture";

const text = (html: string) => html.replace(/<[^>]+>/g, " ").replace(/\s+/g, " ").trim();

describe("PageButtons", () => {
  it("says the page and its count between the two buttons; only the way forward is open on the first page", () => {
    const html = renderTable((table) => <PageButtons table={table} />, { pageSize: 2 });
    expect(text(html)).toBe("Previous page Page 1 of 3 Next page");
    expect(html).toMatch(/disabled="">Previous page<\/button>/);
    expect(html).not.toMatch(/disabled="">Next page<\/button>/);
  });

  it("takes the table's own words and an addition to the count", () => {
    const html = renderTable((table) => <PageButtons table={table} previousText="Earlier page" nextText="Later page" countSuffix=" (5 rows)" />, { pageSize: 4 });
    expect(text(html)).toBe("Earlier page Page 1 of 2 (5 rows) Later page");
  });
});
