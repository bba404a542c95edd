import { describe, expect, it } from "vitest";
import { guardStatement } from "../../../cas/check/guard";
import { readPlain } from "../../../cas/parse/plain";

describe("guardStatement", () => {
  it("refuses huge exponents and huge trees, accepts ordinary steps", () => {
    expect(() => guardStatement(readPlain("(x+1)^100000"), "to")).toThrow(/power 100000/);
    expect(() => guardStatement(readPlain("x+".repeat(6000) + "x"), "to")).toThrow(/parts/);
    expect(() => guardStatement(readPlain("(1 - r_s/r)^2*c^2"), "to")).not.toThrow();
  });
});
