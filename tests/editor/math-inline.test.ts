import { describe, expect, it } from "vitest";
import { nodeFromJSON, parseOuter, renderOuter, schema } from "./support/html-spec";

describe("inline math node", () => {
  it("is an inline atom carrying its source in `latex`", () => {
    const type = schema.nodes.mathInline;
    expect(type.isInline).toBe(true);
    expect(type.isAtom).toBe(true);
    const json = { type: "paragraph", content: [{ type: "text", text: "with " }, { type: "mathInline", attrs: { latex: "\\theta = \\pi/2" } }] };
    expect(nodeFromJSON(json).toJSON()).toEqual(json);
  });

  it("round-trips `latex` through HTML", () => {
    const element = renderOuter(nodeFromJSON({ type: "mathInline", attrs: { latex: "\\dot\\phi" } }));
    expect(element.attributes["data-latex"]).toBe("\\dot\\phi");
    expect(parseOuter(element)).toEqual({ type: "mathInline", attrs: { latex: "\\dot\\phi" } });
  });

  it("is not allowed inside a step's LaTeX source", () => {
    expect(schema.nodes.step.contentMatch.matchType(schema.nodes.mathInline)).toBeNull();
  });
});
