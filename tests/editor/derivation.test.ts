import { describe, expect, it } from "vitest";
import { extractDerivation } from "@/editor/derivation";
import { doc, paragraph, step } from "./support/headless";

const block = (id: string, constants: Array<{ symbol: string; dimension: string }> = []) => ({
  type: "spacetimeBlock",
  attrs: { id, name: id, coordinates: [{ symbol: "r", dimension: "length" }], lineElement: "ds^2 = 0", constants, assumptions: ["r > r_s"], parameter: "\\tau" },
});
const heading = (text: string) => ({ type: "heading", attrs: { level: 2 }, content: [{ type: "text", text }] });

describe("extractDerivation", () => {
  const notebook = doc(
    heading("Setup"),
    step("st-0", "x = 1"), // before any block
    block("sb-1", [{ symbol: "r_s", dimension: "length" }]),
    heading("Orbits"),
    step("st-a", "E = \\mu c^2 \\dot t", { kind: "definition" }),
    paragraph({ type: "text", text: "then" }),
    step("st-b", "  E^2 = \\mu^2 c^4 \\dot t^2 ", { cites: ["st-a", "st-later", "st-c"] }),
    block("sb-2"),
    step("st-c", "y = 2", { kind: "limit", detail: "c \\to \\infty" }),
  );
  const derivation = extractDerivation(notebook);

  it("lists steps in order with their current numbers and trimmed relations", () => {
    expect(derivation.steps.map((s) => [s.id, s.number, s.relation])).toEqual([
      ["st-0", 1, "x = 1"],
      ["st-a", 2, "E = \\mu c^2 \\dot t"],
      ["st-b", 3, "E^2 = \\mu^2 c^4 \\dot t^2"],
      ["st-c", 4, "y = 2"],
    ]);
  });

  it("links each step to the previous non-definition step under the same spacetime block only", () => {
    // st-a is a definition (it goes into the context), so st-b has no previous step
    expect(derivation.steps.map((s) => s.previousId)).toEqual([null, null, null, null]);
    const chain = extractDerivation(doc(block("sb"), step("a", "x=1"), step("d", "y=2", { kind: "definition" }), step("b", "x=y")));
    expect(chain.steps.map((s) => s.previousId)).toEqual([null, "a", "a"]);
    expect(derivation.steps.map((s) => s.blockIndex)).toEqual([null, 0, 0, 1]);
  });

  it("keeps citations of earlier steps only", () => {
    expect(derivation.steps[2].cites).toEqual(["st-a"]);
  });

  it("carries justifications, sections and the blocks' declarations", () => {
    expect(derivation.steps[3]).toMatchObject({ kind: "limit", detail: "c \\to \\infty", section: "Orbits" });
    expect(derivation.steps[0].section).toBe("Setup");
    expect(derivation.blocks[0].constants).toEqual([{ symbol: "r_s", dimension: "length" }]);
    expect(derivation.blocks.map((b) => b.id)).toEqual(["sb-1", "sb-2"]);
  });

  it("skips steps without an id or with a repeated id, and survives junk attributes", () => {
    const odd = extractDerivation(doc(step(null, "a=b"), step("st-x", "a=b"), step("st-x", "b=c"), { type: "spacetimeBlock", attrs: { constants: "nope", assumptions: [1, "r>0"] } }));
    expect(odd.steps.map((s) => s.id)).toEqual(["st-x"]);
    expect(odd.blocks[0]).toMatchObject({ constants: [], assumptions: ["r>0"], parameter: "\\tau" });
  });
});
