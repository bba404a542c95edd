import "server-only";
import { randomBytes } from "node:crypto";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";

/**
 * NEXTAUTH_SECRET when set; otherwise a random secret kept in DATA_DIR, so a fresh clone
 * runs (`npm run demo`) without configuration and sessions survive restarts.
 */
export function authSecret(): string {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  const dataDir = process.env.DATA_DIR?.startsWith("memory://") ? "./.data" : process.env.DATA_DIR || "./.data";
  const file = path.resolve(/* turbopackIgnore: true */ dataDir, "nextauth-secret");
  try {
    return readFileSync(file, "utf8").trim();
  } catch {
    mkdirSync(path.dirname(file), { recursive: true });
    const secret = randomBytes(32).toString("base64url");
    // "wx" fails if another process wrote it first; then read theirs.
    try {
      writeFileSync(file, secret, { flag: "wx", mode: 0o600 });
      return secret;
    } catch {
      return readFileSync(file, "utf8").trim();
    }
  }
}

/** Where links in e-mails point. Never taken from the request's Host header (link poisoning). */
export function appBaseUrl(): string {
  return (process.env.NEXTAUTH_URL || `http://localhost:${process.env.PORT || 3000}`).replace(/\/+$/, "");
}
