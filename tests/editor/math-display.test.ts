import { describe, expect, it } from "vitest";
import { nodeFromJSON, parseOuter, renderOuter, schema } from "./support/html-spec";

describe("display math node", () => {
  it("keeps its LaTeX source as text content and round-trips through JSON", () => {
    const json = { type: "mathDisplay", content: [{ type: "text", text: "r_s = \\frac{2GM}{c^2}" }] };
    const node = nodeFromJSON(json);
    expect(node.textContent).toBe("r_s = \\frac{2GM}{c^2}");
    expect(node.toJSON()).toEqual(json);
    expect(schema.nodes.mathDisplay.allowsMarkType(schema.marks.italic)).toBe(false);
  });

  it("renders as a div of its own type that parses back to display math", () => {
    const element = renderOuter(nodeFromJSON({ type: "mathDisplay" }));
    expect(parseOuter(element)?.type).toBe("mathDisplay");
  });
});
