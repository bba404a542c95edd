// Sign-up, e-mail confirmation and password reset through their route handlers.
import { closeDb, getDb, jsonRequest, noParams } from "../support";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { POST as signUp } from "@/app/api/auth/signup/route";
import { POST as verify } from "@/app/api/auth/verify/route";
import { POST as passwordReset } from "@/app/api/auth/password-reset/route";
import { authorizeWithPassword } from "@/app/_server/auth";
import { resetRateLimits } from "@/app/_server/rate-limit";
import { listMailMessages } from "@/db/queries/mail";
import { getUserByEmail } from "@/db/queries/users";

// Opening a fresh PGlite (initdb + migrations) takes a while on a busy machine.
beforeAll(() => getDb(), 120_000);
afterAll(() => closeDb());
beforeEach(() => resetRateLimits());

async function mailsTo(address: string) {
  return (await listMailMessages({ db: await getDb() })).filter((m) => m.to.includes(address));
}

function tokenIn(text: string): string {
  const match = text.match(/[?&]token=([A-Za-z0-9_-]+)/);
  if (!match) throw new Error(`no token in mail: ${text}`);
  return match[1];
}

const headers = { "x-forwarded-for": "198.51.100.20" };

describe("sign-up with e-mail confirmation", () => {
  it("creates an unconfirmed account, mails a link, and the link confirms it once", async () => {
    const email = "Noether.Fan@Example.test";
    const response = await signUp(jsonRequest("POST", "/api/auth/signup", { name: "Emmy Fan", email, password: "geodesic-1" }), noParams);
    expect(response.status).toBe(202);

    const user = await getUserByEmail({ db: await getDb(), email });
    expect(user).toMatchObject({ email: "noether.fan@example.test", name: "Emmy Fan", emailVerified: null });
    await expect(authorizeWithPassword({ email, password: "geodesic-1" }, headers)).rejects.toThrow(/Confirm your e-mail/);

    const [mail] = await mailsTo("noether.fan@example.test");
    expect(mail.kind).toBe("verify-email");
    expect(mail.text).toContain("/verify-email?token=");
    const token = tokenIn(mail.text);

    const confirmed = await verify(jsonRequest("POST", "/api/auth/verify", { token }), noParams);
    expect(confirmed.status).toBe(200);
    expect(await authorizeWithPassword({ email, password: "geodesic-1" }, headers)).toMatchObject({ email: "noether.fan@example.test" });

    const again = await verify(jsonRequest("POST", "/api/auth/verify", { token }), noParams);
    expect(again.status).toBe(400);
    expect((await again.json()).error.code).toBe("bad_request:token");
  });

  it("answers a sign-up for an existing account exactly like a new one (no enumeration)", async () => {
    const body = (email: string) => ({ name: "Someone", email, password: "another-pass" });
    const fresh = await signUp(jsonRequest("POST", "/api/auth/signup", body("fresh@example.test")), noParams);
    await verify(jsonRequest("POST", "/api/auth/verify", { token: tokenIn((await mailsTo("fresh@example.test"))[0].text) }), noParams);
    const existing = await signUp(jsonRequest("POST", "/api/auth/signup", body("fresh@example.test")), noParams);
    const brandNew = await signUp(jsonRequest("POST", "/api/auth/signup", body("brand-new@example.test")), noParams);
    expect(existing.status).toBe(brandNew.status);
    expect(await existing.json()).toEqual(await brandNew.json());
    expect(fresh.status).toBe(202);
    // The owner of the existing account hears about it; their password is unchanged.
    const kinds = (await mailsTo("fresh@example.test")).map((m) => m.kind);
    expect(kinds).toContain("account-exists");
    expect(await authorizeWithPassword({ email: "fresh@example.test", password: "another-pass" }, headers)).not.toBeNull();
  });

  it("refuses malformed JSON, a wrong content type, wrong types and overlong fields with a clear 4xx", async () => {
    const malformed = await signUp(jsonRequest("POST", "/api/auth/signup", "{not json"), noParams);
    expect(malformed.status).toBe(400);
    expect((await malformed.json()).error.code).toBe("bad_request:json");

    const form = await signUp(jsonRequest("POST", "/api/auth/signup", "name=x", { "content-type": "application/x-www-form-urlencoded" }), noParams);
    expect(form.status).toBe(415);

    const wrongType = await signUp(jsonRequest("POST", "/api/auth/signup", { name: 7, email: "x@example.test", password: "longenough" }), noParams);
    expect(wrongType.status).toBe(400);
    expect((await wrongType.json()).error.message).toContain("name");

    const longName = await signUp(jsonRequest("POST", "/api/auth/signup", { name: "x".repeat(101), email: "x@example.test", password: "longenough" }), noParams);
    expect(longName.status).toBe(400);
    const short = await signUp(jsonRequest("POST", "/api/auth/signup", { name: "x", email: "x@example.test", password: "short" }), noParams);
    expect(short.status).toBe(400);
    expect(await getUserByEmail({ db: await getDb(), email: "x@example.test" })).toBeNull();
  });
});

describe("password reset", () => {
  it("answers the same for known and unknown addresses and mails only the known one", async () => {
    await signUp(jsonRequest("POST", "/api/auth/signup", { name: "Known", email: "known@example.test", password: "first-password" }), noParams);
    const known = await passwordReset(jsonRequest("POST", "/api/auth/password-reset", { email: "known@example.test" }), noParams);
    const unknown = await passwordReset(jsonRequest("POST", "/api/auth/password-reset", { email: "nobody@example.test" }), noParams);
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(await known.json()).toEqual(await unknown.json());
    expect(await mailsTo("nobody@example.test")).toHaveLength(0);

    const resetMail = (await mailsTo("known@example.test")).find((m) => m.kind === "reset-password")!;
    const token = tokenIn(resetMail.text);
    const done = await passwordReset(jsonRequest("POST", "/api/auth/password-reset", { token, password: "second-password" }), noParams);
    expect(done.status).toBe(200);
    // The reset link proves the mailbox, so the account is confirmed too.
    expect(await authorizeWithPassword({ email: "known@example.test", password: "second-password" }, headers)).not.toBeNull();
    expect(await authorizeWithPassword({ email: "known@example.test", password: "first-password" }, headers)).toBeNull();

    const reused = await passwordReset(jsonRequest("POST", "/api/auth/password-reset", { token, password: "third-password" }), noParams);
    expect(reused.status).toBe(400);
  });

  it("limits how many mails one address can make us send", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 22; i += 1) {
      const response = await passwordReset(jsonRequest("POST", "/api/auth/password-reset", { email: `flood-${i}@example.test` }, { "x-forwarded-for": "192.0.2.99" }), noParams);
      statuses.push(response.status);
    }
    expect(statuses.slice(0, 20).every((s) => s === 202)).toBe(true);
    expect(statuses.slice(20)).toEqual([429, 429]);
  });
});
