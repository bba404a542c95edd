import "server-only";
import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";
import { AppError } from "./errors";

// Per process, in memory: enough for one server. Kept on globalThis so dev reloads keep counts.
type Limiters = { signInByIp: RateLimiterMemory; signInByAccount: RateLimiterMemory; mailByIp: RateLimiterMemory; casByIp: RateLimiterMemory };
const key = Symbol.for("vierbein.rate-limiters");
const store = globalThis as unknown as Record<symbol, Limiters | undefined>;

function limiters(): Limiters {
  return (store[key] ??= {
    // Failed sign-ins from one network address: 30 per 15 minutes (many accounts, one guesser).
    signInByIp: new RateLimiterMemory({ keyPrefix: "sign-in-ip", points: 30, duration: 15 * 60 }),
    // Failed passwords for one account: 5, then 15 minutes' pause. Keyed by the typed
    // address whether or not it exists, so the pause reveals nothing.
    signInByAccount: new RateLimiterMemory({ keyPrefix: "sign-in-account", points: 5, duration: 15 * 60, blockDuration: 15 * 60 }),
    // Mails we send on request (sign-up, password reset): 20 per hour per network address.
    mailByIp: new RateLimiterMemory({ keyPrefix: "mail-ip", points: 20, duration: 60 * 60 }),
    // The open engine endpoint: 120 verbs a minute per network address, far above a script
    // checking a derivation step by step, well below what would keep the worker pool busy for others.
    casByIp: new RateLimiterMemory({ keyPrefix: "cas-ip", points: 120, duration: 60 }),
  });
}

const pauseMessage = "Too many sign-in attempts. Wait a few minutes and try again.";

function isRejection(error: unknown): error is RateLimiterRes {
  return error instanceof RateLimiterRes;
}

function exhausted(res: RateLimiterRes | null): boolean {
  return res !== null && res.remainingPoints <= 0;
}

/**
 * Throws rate_limited when the network address or the account has used up its failures.
 * Only failures count, so a class of students signing in behind one address is not paused.
 */
export async function checkSignInAllowed({ ip, email }: { ip: string; email: string }): Promise<void> {
  const { signInByIp, signInByAccount } = limiters();
  const [byIp, byAccount] = await Promise.all([signInByIp.get(ip), signInByAccount.get(email)]);
  if (exhausted(byIp) || exhausted(byAccount)) throw new AppError("rate_limited:sign-in", pauseMessage);
}

export async function recordSignInFailure({ ip, email }: { ip: string; email: string }): Promise<void> {
  const { signInByIp, signInByAccount } = limiters();
  const ignoreRejection = (error: unknown) => {
    if (!isRejection(error)) throw error;
  };
  await Promise.all([signInByIp.consume(ip).catch(ignoreRejection), signInByAccount.consume(email).catch(ignoreRejection)]);
}

export async function recordSignInSuccess({ email }: { email: string }): Promise<void> {
  await limiters().signInByAccount.delete(email);
}

/** Limits requests that make us send mail (sign-up, reset) so the app cannot be used to flood an inbox. */
export async function checkMailRequestAllowed({ ip }: { ip: string }): Promise<void> {
  try {
    await limiters().mailByIp.consume(ip);
  } catch (error) {
    if (isRejection(error)) throw new AppError("rate_limited:mail", "Too many requests from your network. Try again later.");
    throw error;
  }
}

/** Limits the open engine endpoint (POST /api/cas/<verb>) per network address; false once used up. */
export async function casRequestAllowed({ ip }: { ip: string }): Promise<boolean> {
  try {
    await limiters().casByIp.consume(ip);
    return true;
  } catch (error) {
    if (isRejection(error)) return false;
    throw error;
  }
}

/** Forgets every count (tests). */
export function resetRateLimits(): void {
  store[key] = undefined;
}
