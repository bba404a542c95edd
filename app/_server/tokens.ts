import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** A fresh one-time token for a link: the raw value goes in the e-mail, only its hash is stored. */
export function newToken(): { raw: string; hash: string } {
  const raw = randomBytes(32).toString("base64url");
  return { raw, hash: hashToken(raw) };
}

export function hashToken(raw: string): string {
  return createHash("sha256").update(raw).digest("hex");
}
