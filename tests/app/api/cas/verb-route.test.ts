import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { resetRateLimits } from "../../../../app/_server/rate-limit";
import { POST } from "../../../../app/api/cas/[verb]/route";
import { sharedCasPool } from "../../../../cas/worker/node-pool";
import { STEP_CORPUS } from "../../../cas/check/step-corpus";

afterAll(() => sharedCasPool().close());

const call = (verb: string, body: string, headers: Record<string, string> = { "content-type": "application/json" }) =>
  POST(new Request(`http://localhost/api/cas/${verb}`, { method: "POST", body, headers }), { params: Promise.resolve({ verb }) });

describe("POST /api/cas/[verb]", () => {
  beforeEach(() => resetRateLimits());

  it("answers a check with its verdict", async () => {
    const res = await call("check", JSON.stringify(STEP_CORPUS.find((s) => s.id === "substitute-E-L")!.request));
    expect(res.status).toBe(200);
    expect((await res.json()).verdict).toBe("verified");
  });

  it("answers dims", async () => {
    const res = await call("dims", JSON.stringify({ context: { symbols: { E: "energy", "\\mu": "mass" } }, relation: "E = \\mu c^2" }));
    expect(res.status).toBe(200);
    expect((await res.json()).consistent).toBe(true);
  });

  it("refuses bad requests with {error: {code, message, position?}} and the documented status", async () => {
    const cases: [string, string, number, string][] = [
      ["check", "{oops", 400, "malformed"],
      ["check", JSON.stringify({ context: {}, to: 1 }), 400, "malformed"],
      ["check", JSON.stringify({ context: {}, from: "x", to: "\\frac{1}{" }), 400, "unreadable"],
      ["check", JSON.stringify({ context: {}, from: "(x+1)^{100000}", to: "x" }), 422, "too_large"],
      ["nonsense", "{}", 404, "unknown_verb"],
      ["check", JSON.stringify({ context: {}, from: "x".repeat(1 << 20), to: "x" }), 413, "too_large"],
    ];
    for (const [verb, body, status, code] of cases) {
      const res = await call(verb, body);
      expect(res.status, body.slice(0, 60)).toBe(status);
      const json = await res.json();
      expect(json.error.code).toBe(code);
      expect(typeof json.error.message).toBe("string");
    }
    const unreadable = await (await call("check", JSON.stringify({ context: {}, from: "x", to: "\\left(1-x" }))).json();
    expect(unreadable.error.position).toBeTypeOf("number");
    expect(unreadable.error.field).toBe("to");
  });

  it("refuses a body that is not JSON by content type", async () => {
    const res = await call("check", "x", { "content-type": "text/plain" });
    expect(res.status).toBe(415);
  });

  it("keeps serving after a hostile request", async () => {
    await call("check", JSON.stringify({ context: {}, from: "(".repeat(10_000) + "x" + ")".repeat(10_000), to: "x" }));
    const res = await call("check", JSON.stringify({ context: {}, from: "(a+b)^2", to: "a^2+2ab+b^2" }));
    expect(res.status).toBe(200);
  });

  it("answers 429 once one address has sent 120 requests in a minute, and other addresses still get answers", async () => {
    const from = (ip: string) => ({ "content-type": "application/json", "x-forwarded-for": ip });
    const malformed = "{oops"; // refused before the worker, so the loop is cheap
    for (let i = 0; i < 120; i++) expect((await call("check", malformed, from("192.0.2.7"))).status).toBe(400);
    const limited = await call("check", malformed, from("192.0.2.7"));
    expect(limited.status).toBe(429);
    expect((await limited.json()).error.code).toBe("rate_limited");
    expect((await call("check", malformed, from("192.0.2.8"))).status).toBe(400);
  });
});
