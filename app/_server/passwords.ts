import "server-only";
import bcrypt from "bcryptjs";

// 11 rounds: ~0.2 s per hash on this class of machine; OWASP asks for at least 10.
// BCRYPT_ROUNDS lowers it for tests only (they hash hundreds of times); never below 4.
const ROUNDS = Math.max(4, Number(process.env.BCRYPT_ROUNDS) || 11);

export const passwordRules = { min: 8, max: 72 } as const; // bcrypt reads at most 72 bytes

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, ROUNDS);
}

// A real hash of a random string: comparing against it costs as much as a real check,
// so "no such account" and "wrong password" take the same time.
const decoyHash = bcrypt.hashSync(Math.random().toString(36), ROUNDS);

/** True only when the account has a password and it matches. */
export async function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  if (!hash) {
    await bcrypt.compare(password, decoyHash);
    return false;
  }
  return bcrypt.compare(password, hash);
}
