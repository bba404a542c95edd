import { describe, expect, it } from "vitest";
import { placesAttachment } from "@/editor/figure";

describe("which attachments a document's figures show", () => {
  const figure = (attachmentId: string) => ({ type: "figure", attrs: { attachmentId, format: "image", caption: "" } });

  it("finds a figure at any depth and only for its own attachment", () => {
    const json = { type: "doc", content: [{ type: "paragraph" }, { type: "blockquote", content: [figure("att-2")] }] };
    expect(placesAttachment(json, "att-2")).toBe(true);
    expect(placesAttachment(json, "att-1")).toBe(false);
  });

  it("does not count an attachment id that appears only in text", () => {
    const json = { type: "doc", content: [{ type: "paragraph", content: [{ type: "text", text: "att-3" }] }] };
    expect(placesAttachment(json, "att-3")).toBe(false);
  });
});
