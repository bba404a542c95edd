import { describe, expect, it } from "vitest";
import { roleArticle, roleLabel } from "@/components/data/roles";

// English article before the role names of the glossary (common practice, no source).
describe("role wording", () => {
  it("says the group lead, an author, a reviewer, a reader", () => {
    expect(["lead", "author", "reviewer", "reader"].map((r) => `${roleArticle(r)} ${roleLabel(r)}`)).toEqual(["the group lead", "an author", "a reviewer", "a reader"]);
  });
});
