import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { canonicalJson, editionSha256 } from "@/app/_server/editions/canonical";

describe("canonicalJson", () => {
  it("sorts keys at every depth, keeps array order, drops undefined and has no whitespace", () => {
    expect(canonicalJson({ b: 1, a: [{ d: null, c: "x" }, 2], u: undefined })).toBe('{"a":[{"c":"x","d":null},2],"b":1}');
  });

  it("does not depend on the order keys were written in", () => {
    expect(canonicalJson({ x: { q: 1, p: 2 }, y: 3 })).toBe(canonicalJson({ y: 3, x: { p: 2, q: 1 } }));
  });
});

describe("editionSha256", () => {
  const facts = { notebookId: "n", number: 1, title: "T", content: { type: "doc" }, ledger: [], reason: null };

  it("is the SHA-256 of the documented canonical form", () => {
    // The documented form, written out by hand (app/_server/editions/canonical.ts).
    const canonical = '{"content":{"type":"doc"},"format":"vierbein-edition/1","ledger":[],"notebookId":"n","number":1,"reason":null,"title":"T"}';
    expect(editionSha256(facts)).toBe(createHash("sha256").update(canonical).digest("hex"));
  });

  it("changes with the number, the content or the reason", () => {
    const base = editionSha256(facts);
    expect(editionSha256({ ...facts, number: 2 })).not.toBe(base);
    expect(editionSha256({ ...facts, content: { type: "doc", content: [] } })).not.toBe(base);
    expect(editionSha256({ ...facts, reason: "why" })).not.toBe(base);
  });
});
