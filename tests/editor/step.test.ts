import { describe, expect, it } from "vitest";
import { JUSTIFICATION_KINDS } from "@/editor/step";
import { nodeFromJSON, parseOuter, renderOuter, schema } from "./support/html-spec";

const stepJSON = {
  type: "step",
  attrs: { id: "st-a", kind: "euler-lagrange", detail: "r", cites: ["st-0", "st-1"], follows: "st-0" },
  content: [{ type: "text", text: "\\frac{d}{d\\tau}\\left(\\frac{\\dot r}{1-r_s/r}\\right) = 0" }],
};

describe("step node", () => {
  it("holds plain LaTeX text only: no marks, no nested blocks", () => {
    const type = schema.nodes.step;
    expect(type.spec.code).toBe(true);
    expect(type.allowsMarkType(schema.marks.bold)).toBe(false);
    expect(type.contentMatch.matchType(schema.nodes.paragraph)).toBeNull();
    expect(() => nodeFromJSON({ type: "step", content: [{ type: "paragraph" }] }).check()).toThrow();
  });

  it("round-trips through JSON with its id, justification and citations", () => {
    const node = nodeFromJSON(stepJSON);
    expect(node.toJSON()).toEqual(stepJSON);
  });

  it("defaults to an algebra step without citations", () => {
    const node = nodeFromJSON({ type: "step" });
    expect(node.attrs).toEqual({ id: null, kind: "algebra", detail: "", cites: [], follows: null });
  });

  it("round-trips its attributes through HTML", () => {
    const element = renderOuter(nodeFromJSON(stepJSON));
    expect(element.attributes["data-type"]).toBe("step");
    expect(element.attributes["data-cites"]).toBe("st-0 st-1");
    expect(parseOuter(element)).toEqual({ type: "step", attrs: stepJSON.attrs });
  });

  it("reads an unknown justification in HTML as algebra rather than failing", () => {
    const element = renderOuter(nodeFromJSON(stepJSON));
    const tampered = { ...element, getAttribute: (name: string) => (name === "data-justification" ? "magic" : element.getAttribute(name)) };
    expect(parseOuter(tampered)?.attrs.kind).toBe("algebra");
  });

  it("names the same justification kinds as the checker protocol", () => {
    // cas/check/protocol.ts Justification["kind"]
    expect([...JUSTIFICATION_KINDS].sort()).toEqual(["algebra", "definition", "differentiate", "euler-lagrange", "limit", "substitute"]);
  });
});
