import { closeDb, getDb } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/health/route";

// Opening a fresh PGlite (initdb + migrations) takes a while on a busy machine.
beforeAll(() => getDb(), 120_000);
afterAll(() => closeDb());

describe("GET /api/health", () => {
  it("answers ok and names the store", async () => {
    const response = await GET();
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ ok: true, db: "pglite" });
  });
});
