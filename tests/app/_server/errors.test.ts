import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { AppError, handleRoute, statusByKind } from "@/app/_server/errors";

const request = () => new Request("http://localhost/api/thing", { method: "POST" });
const context = { params: Promise.resolve({}) };

describe("AppError", () => {
  it("splits kind:surface and maps the kind to its HTTP status", () => {
    const error = new AppError("forbidden:notebook", "No.");
    expect([error.kind, error.surface, error.code, error.status]).toEqual(["forbidden", "notebook", "forbidden:notebook", 403]);
    expect(statusByKind).toMatchObject({ bad_request: 400, unauthorized: 401, forbidden: 403, not_found: 404, conflict: 409, payload_too_large: 413, unsupported_media_type: 415 });
  });

  it("keeps the cause", () => {
    const cause = new Error("inner");
    expect(new AppError("bad_request:cas", "Bad.", { cause }).cause).toBe(cause);
  });
});

describe("handleRoute", () => {
  it("answers an AppError with its status and {error: {code, message}}", async () => {
    const response = await handleRoute(async () => {
      throw new AppError("not_found:notebook", "No notebook with that id.");
    })(request(), context);
    expect(response.status).toBe(404);
    expect(await response.json()).toEqual({ error: { code: "not_found:notebook", message: "No notebook with that id." } });
  });

  it("turns a zod failure into a 400 naming the field", async () => {
    const response = await handleRoute(async () => {
      z.object({ title: z.string() }).parse({ title: 3 });
      return new Response("unreachable");
    })(request(), context);
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(body.error.code).toBe("bad_request:input");
    expect(body.error.message).toContain("title");
  });

  it("logs an unexpected error but sends none of its internals", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const response = await handleRoute(async () => {
      throw new Error('relation "secret_table" does not exist at /srv/app/db.ts:12');
    })(request(), context);
    expect(response.status).toBe(500);
    const text = await response.text();
    expect(text).not.toContain("secret_table");
    expect(text).not.toContain("/srv/app");
    expect(JSON.parse(text).error.code).toBe("internal:server");
    expect(log).toHaveBeenCalled();
    log.mockRestore();
  });
});
