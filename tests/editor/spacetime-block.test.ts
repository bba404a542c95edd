import { describe, expect, it } from "vitest";
import { nodeFromJSON, parseOuter, renderOuter } from "./support/html-spec";

const block = {
  type: "spacetimeBlock",
  attrs: {
    id: "sb-1",
    name: "Exterior of Kessel-7",
    coordinates: [
      { symbol: "t", dimension: "time" },
      { symbol: "r", dimension: "length" },
      { symbol: "\\theta", dimension: "dimensionless" },
      { symbol: "\\phi", dimension: "dimensionless" },
    ],
    lineElement: "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2\\,dt^2 + \\frac{dr^2}{1-\\frac{r_s}{r}} + r^2 d\\Omega^2",
    constants: [{ symbol: "r_s", dimension: "length", note: "Schwarzschild radius" }],
    assumptions: ["r > r_s"],
    parameter: "\\tau",
  },
};

describe("spacetime block node", () => {
  it("round-trips all its fields through JSON", () => {
    expect(nodeFromJSON(block).toJSON()).toEqual(block);
  });

  it("round-trips all its fields through HTML (lists as JSON attributes)", () => {
    const element = renderOuter(nodeFromJSON(block));
    expect(JSON.parse(element.attributes["data-assumptions"])).toEqual(["r > r_s"]);
    expect(parseOuter(element)).toEqual({ type: "spacetimeBlock", attrs: block.attrs });
  });

  it("reads a damaged list attribute as empty instead of failing the paste", () => {
    const element = renderOuter(nodeFromJSON(block));
    const damaged = { ...element, getAttribute: (name: string) => (name === "data-constants" ? "[{oops" : element.getAttribute(name)) };
    expect(parseOuter(damaged)?.attrs.constants).toEqual([]);
  });

  it("defaults the curve parameter to proper time", () => {
    expect(nodeFromJSON({ type: "spacetimeBlock" }).attrs.parameter).toBe("\\tau");
  });
});
