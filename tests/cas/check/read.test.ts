import { describe, expect, it } from "vitest";
import { readCheckRequest, readContext } from "../../../cas/check/read";
import { CasRequestError } from "../../../cas/check/errors";

describe("readCheckRequest", () => {
  it("normalises declared names and reads dimensions", () => {
    const rc = readContext({ symbols: { "r_{s}": "length", "\\mu": "mass", E: null }, assumptions: ["r > r_{s}"] });
    expect([...rc.dimensions.symbols.keys()]).toEqual(["r_s", "mu", "E"]);
    expect(rc.dimensions.symbols.get("E")).toBeNull();
    expect(rc.parsed.parameter).toBe("tau");
  });

  it("reads differentials of the parameter and the coordinates", () => {
    const { step } = readCheckRequest({ context: { symbols: { r: "length", t: "time" } }, from: "-c^2 d\\tau^2 = -c^2 dt^2 + dr^2", to: "-c^2 = -c^2\\dot t^2 + \\dot r^2" });
    expect(JSON.stringify(step.from)).toContain('"differential","name":"tau"');
  });

  it("refuses a malformed dimension and a relation where one is needed", () => {
    expect(() => readContext({ symbols: { r: "metres" } })).toThrow(CasRequestError);
    expect(() => readContext({ assumptions: ["r"] })).toThrow(/must be a relation/);
  });

  it("reads justifications", () => {
    const { step } = readCheckRequest({ context: {}, from: "x", to: "x", justification: { kind: "limit", symbol: "c", to: "\\infty" } });
    expect(step.justification).toEqual({ kind: "limit", symbol: "c", to: { kind: "infinity" } });
    const el = readCheckRequest({ context: {}, from: "x", to: "x", justification: { kind: "euler-lagrange", coordinate: "\\phi", parameter: "\\tau" } });
    expect(el.step.justification).toEqual({ kind: "euler-lagrange", coordinate: "phi", parameter: "tau" });
  });
});
