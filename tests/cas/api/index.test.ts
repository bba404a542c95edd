import { describe, expect, it } from "vitest";
import { VERBS, isVerb, runVerb, validateVerbInput } from "../../../cas/api/index";

describe("the cas verb registry", () => {
  it("lists check and dims, and answers through runVerb", () => {
    expect(isVerb("check") && isVerb("dims")).toBe(true);
    expect(isVerb("toString")).toBe(false);
    expect(Object.keys(VERBS)).toEqual(expect.arrayContaining(["check", "dims"]));
    expect(runVerb("check", { context: {}, from: "x^2", to: "x x" })).toMatchObject({ ok: true, value: { verdict: "verified" } });
  });

  it("never throws: refusals come back as errors with a code", () => {
    expect(validateVerbInput("check", { context: {}, to: 1 })).toMatchObject({ code: "malformed" });
    expect(validateVerbInput("check", { context: {}, from: "x", to: "x", extra: 1 })).toMatchObject({ code: "malformed" });
    expect(runVerb("check", { context: {}, from: "x", to: "\\left(x" })).toMatchObject({ ok: false, error: { code: "unreadable", field: "to" } });
    expect(runVerb("check", { context: {}, from: "x".repeat(30_000), to: "x" })).toMatchObject({ ok: false, error: { code: "too_large" } });
    expect(runVerb("dims", { context: { symbols: { r: "furlongs" } }, relation: "r = r" })).toMatchObject({ ok: false, error: { code: "malformed" } });
  });
});
