import "server-only";
import { getDb } from "@/db/client";
import { consumeVerificationTokenOfPurpose, createVerificationToken, deleteVerificationTokens } from "@/db/queries/tokens";
import { createUser, getUserByEmail, normalizeEmail, updateUser } from "@/db/queries/users";
import { AppError } from "./errors";
import { sendMail } from "./mail";
import { hashPassword } from "./passwords";
import { checkMailRequestAllowed, recordSignInSuccess } from "./rate-limit";
import { appBaseUrl } from "./secret";
import { newToken, hashToken } from "./tokens";

// Sign-up, e-mail confirmation and password reset. Each request answers the same whether
// or not the address has an account; only the mailbox owner learns the difference.

const VERIFY = "verify-email";
const RESET = "reset-password";
const DAY = 24 * 60 * 60 * 1000;
const HOUR = 60 * 60 * 1000;

const badLink = "This link is not valid any more: it was already used or has expired. Ask for a new one.";

async function issueToken({ purpose, email, lifetimeMs }: { purpose: string; email: string; lifetimeMs: number }) {
  const db = await getDb();
  const identifier = `${purpose}:${email}`;
  // One live link per purpose: a new request makes older links useless.
  await deleteVerificationTokens({ db, identifier });
  const token = newToken();
  await createVerificationToken({ db, identifier, token: token.hash, expires: new Date(Date.now() + lifetimeMs) });
  return token.raw;
}

function link(path: string, token: string, email: string): string {
  return `${appBaseUrl()}${path}?${new URLSearchParams({ token, email })}`;
}

export async function signUp({ name, email, password, ip }: { name: string; email: string; password: string; ip: string }): Promise<void> {
  await checkMailRequestAllowed({ ip });
  const db = await getDb();
  const address = normalizeEmail(email);
  // Hash in every branch so the answer takes as long whether or not the account exists.
  const passwordHash = await hashPassword(password);
  const existing = await getUserByEmail({ db, email: address });

  if (existing?.emailVerified) {
    await sendMail({
      kind: "account-exists",
      to: address,
      subject: "Someone tried to sign up to Vierbein with your address",
      text: `There is already a Vierbein account for this address. Sign in at ${appBaseUrl()}/sign-in, or reset your password at ${appBaseUrl()}/reset-password.\n\nIf this was not you, ignore this mail; nothing was changed.`,
    });
    return;
  }
  if (existing) {
    // Unconfirmed: whoever confirms the address decides the password, so the latest sign-up wins.
    await updateUser({ db, id: existing.id, changes: { name, passwordHash } });
  } else {
    try {
      await createUser({ db, email: address, name, passwordHash });
    } catch (error) {
      // Two sign-ups for one address at once: the other one created it; answer the same way.
      if (await getUserByEmail({ db, email: address })) return;
      throw error;
    }
  }
  const token = await issueToken({ purpose: VERIFY, email: address, lifetimeMs: DAY });
  await sendMail({
    kind: "verify-email",
    to: address,
    subject: "Confirm your e-mail address for Vierbein",
    text: `Welcome to Vierbein, ${name}.\n\nConfirm your address by opening this link:\n\n${link("/verify-email", token, address)}\n\nIt works once, for 24 hours.`,
  });
}

export async function verifyEmail({ token }: { token: string }): Promise<void> {
  const db = await getDb();
  const row = await consumeVerificationTokenOfPurpose({ db, purpose: VERIFY, token: hashToken(token) });
  if (!row || row.expires < new Date()) throw new AppError("bad_request:token", badLink);
  const user = await getUserByEmail({ db, email: row.identifier.slice(VERIFY.length + 1) });
  if (!user) throw new AppError("bad_request:token", badLink);
  if (!user.emailVerified) await updateUser({ db, id: user.id, changes: { emailVerified: new Date() } });
}

export async function requestPasswordReset({ email, ip }: { email: string; ip: string }): Promise<void> {
  await checkMailRequestAllowed({ ip });
  const db = await getDb();
  const address = normalizeEmail(email);
  const user = await getUserByEmail({ db, email: address });
  if (!user) return;
  const token = await issueToken({ purpose: RESET, email: address, lifetimeMs: HOUR });
  await sendMail({
    kind: "reset-password",
    to: address,
    subject: "Reset your Vierbein password",
    text: `Open this link to choose a new password:\n\n${link("/reset-password", token, address)}\n\nIt works once, for one hour. If you did not ask for it, ignore this mail; your password stays as it is.`,
  });
}

export async function resetPassword({ token, password }: { token: string; password: string }): Promise<void> {
  const db = await getDb();
  const row = await consumeVerificationTokenOfPurpose({ db, purpose: RESET, token: hashToken(token) });
  if (!row || row.expires < new Date()) throw new AppError("bad_request:token", badLink);
  const email = row.identifier.slice(RESET.length + 1);
  const user = await getUserByEmail({ db, email });
  if (!user) throw new AppError("bad_request:token", badLink);
  // Opening the mailed link proves the address, so a reset also confirms it.
  await updateUser({
    db,
    id: user.id,
    changes: { passwordHash: await hashPassword(password), emailVerified: user.emailVerified ?? new Date() },
  });
  await recordSignInSuccess({ email });
}
