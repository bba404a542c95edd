// Password sign-in under the rate limits (next-auth's Credentials provider calls authorizeWithPassword).
import { closeDb, getDb } from "../../api/support";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { authorizeWithPassword, getCurrentUser, setCurrentUserSource } from "@/app/_server/auth";
import { hashPassword } from "@/app/_server/passwords";
import { resetRateLimits } from "@/app/_server/rate-limit";
import { createUser } from "@/db/queries/users";

// Opening a fresh PGlite (initdb + migrations) takes a while on a busy machine.
beforeAll(() => getDb(), 120_000);
afterAll(() => closeDb());
beforeEach(() => resetRateLimits());

async function account(email: string, verified = true) {
  return createUser({ db: await getDb(), email, name: "Tester", passwordHash: await hashPassword("correct horse"), emailVerified: verified ? new Date() : null });
}

const from = (ip: string) => ({ "x-forwarded-for": ip });

describe("authorizeWithPassword", () => {
  it("signs in with the right password, case-insensitively on the address", async () => {
    const user = await account("kepler@example.test");
    expect(await authorizeWithPassword({ email: " Kepler@Example.test ", password: "correct horse" }, from("10.0.0.1"))).toEqual({
      id: user.id,
      email: "kepler@example.test",
      name: "Tester",
    });
  });

  it("gives the same null for a wrong password and for an unknown address", async () => {
    await account("brahe@example.test");
    expect(await authorizeWithPassword({ email: "brahe@example.test", password: "wrong" }, from("10.0.0.2"))).toBeNull();
    expect(await authorizeWithPassword({ email: "no-such@example.test", password: "wrong" }, from("10.0.0.2"))).toBeNull();
    expect(await authorizeWithPassword({ email: 42, password: null } as never, from("10.0.0.2"))).toBeNull();
  });

  it("pauses an account after five failed passwords, even for the right one, from any address", async () => {
    await account("tycho@example.test");
    for (let i = 0; i < 5; i += 1) {
      expect(await authorizeWithPassword({ email: "tycho@example.test", password: `guess-${i}` }, from(`10.1.0.${i}`))).toBeNull();
    }
    await expect(authorizeWithPassword({ email: "tycho@example.test", password: "correct horse" }, from("10.1.1.1"))).rejects.toThrow(/Too many sign-in attempts/);
  });

  it("pauses an unknown address the same way (the pause reveals nothing)", async () => {
    for (let i = 0; i < 5; i += 1) await authorizeWithPassword({ email: "ghost@example.test", password: "x" }, from(`10.2.0.${i}`));
    await expect(authorizeWithPassword({ email: "ghost@example.test", password: "x" }, from("10.2.1.1"))).rejects.toThrow(/Too many sign-in attempts/);
  });

  it("limits failed attempts from one network address across many accounts", async () => {
    const outcomes: string[] = [];
    for (let i = 0; i < 31; i += 1) {
      outcomes.push(
        await authorizeWithPassword({ email: `spray-${i}@example.test`, password: "x" }, from("10.3.0.1")).then(
          () => "answered",
          () => "paused",
        ),
      );
    }
    expect(outcomes.slice(0, 30).every((o) => o === "answered")).toBe(true);
    expect(outcomes[30]).toBe("paused");
  });

  it("does not count successful sign-ins against the network address", async () => {
    await account("often@example.test");
    for (let i = 0; i < 35; i += 1) {
      expect(await authorizeWithPassword({ email: "often@example.test", password: "correct horse" }, from("10.5.0.1"))).not.toBeNull();
    }
  });

  it("refuses an unconfirmed account only after the right password", async () => {
    await account("unconfirmed@example.test", false);
    expect(await authorizeWithPassword({ email: "unconfirmed@example.test", password: "nope" }, from("10.4.0.1"))).toBeNull();
    await expect(authorizeWithPassword({ email: "unconfirmed@example.test", password: "correct horse" }, from("10.4.0.1"))).rejects.toThrow(/Confirm your e-mail/);
  });
});

describe("getCurrentUser seam", () => {
  it("returns whatever the installed source says, and can be restored", async () => {
    setCurrentUserSource(async () => ({ id: "u", email: "u@example.test", name: "U" }));
    expect(await getCurrentUser()).toEqual({ id: "u", email: "u@example.test", name: "U" });
    setCurrentUserSource(null);
  });
});
