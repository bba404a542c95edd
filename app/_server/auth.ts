import "server-only";
import type { NextAuthOptions } from "next-auth";
import { getServerSession } from "next-auth/next";
import CredentialsProvider from "next-auth/providers/credentials";
import EmailProvider from "next-auth/providers/email";
import { z } from "zod";
import { getDb } from "@/db/client";
import { getUserByEmail, getUserById, normalizeEmail } from "@/db/queries/users";
import { drizzleAdapter } from "./adapter";
import { AppError } from "./errors";
import { sendMail } from "./mail";
import { verifyPassword } from "./passwords";
import { checkSignInAllowed, recordSignInFailure, recordSignInSuccess } from "./rate-limit";
import { clientIp } from "./request-info";
import { authSecret } from "./secret";

export type CurrentUser = { id: string; email: string; name: string };

const credentialsSchema = z.object({ email: z.string().trim().max(254), password: z.string().max(200) });

// Thrown messages reach the sign-in form as `error`; each is a sentence that says nothing
// about whether the account exists.
const unverifiedMessage = "Confirm your e-mail address first: open the link we sent you, or sign in with an e-mailed link.";

/** Checks e-mail + password under the rate limits. Exported for tests; next-auth calls it through authorize. */
export async function authorizeWithPassword(
  raw: Record<string, unknown> | undefined,
  headers: Record<string, string | string[] | undefined> | Headers | undefined,
): Promise<CurrentUser | null> {
  const parsed = credentialsSchema.safeParse(raw ?? {});
  if (!parsed.success) return null;
  const email = normalizeEmail(parsed.data.email);
  const ip = clientIp(headers);
  try {
    await checkSignInAllowed({ ip, email });
  } catch (error) {
    if (error instanceof AppError) throw new Error(error.message);
    throw error;
  }
  const user = await getUserByEmail({ db: await getDb(), email });
  const matches = await verifyPassword(parsed.data.password, user?.passwordHash);
  if (!user || !matches) {
    await recordSignInFailure({ ip, email });
    return null;
  }
  await recordSignInSuccess({ email });
  // Only someone who knows the password learns that the address is unconfirmed.
  if (!user.emailVerified) throw new Error(unverifiedMessage);
  return { id: user.id, email: user.email, name: user.name };
}

export const authOptions: NextAuthOptions = {
  secret: authSecret(),
  adapter: drizzleAdapter(getDb),
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: "/sign-in", verifyRequest: "/verify-email", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      id: "credentials",
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      authorize: (credentials, req) => authorizeWithPassword(credentials, req?.headers),
    }),
    EmailProvider({
      // Not used: sendVerificationRequest below sends through our own mail module.
      server: process.env.SMTP_URL || "smtp://localhost:25",
      maxAge: 24 * 60 * 60,
      async sendVerificationRequest({ identifier, url }) {
        await sendMail({
          kind: "sign-in-link",
          to: identifier,
          subject: "Your Vierbein sign-in link",
          text: `Open this link to sign in to Vierbein:\n\n${url}\n\nIt works once, for 24 hours. If you did not ask for it, ignore this mail.`,
        });
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) token.sub = user.id;
      return token;
    },
    async session({ session, token }) {
      if (session.user && token.sub) (session.user as { id?: string }).id = token.sub;
      return session;
    },
  },
};

/** The signed-in user from the next-auth session, re-read from the database (a deleted account is signed out). */
async function userFromSession(): Promise<CurrentUser | null> {
  const session = await getServerSession(authOptions);
  const id = (session?.user as { id?: string } | undefined)?.id;
  if (!id) return null;
  const user = await getUserById({ db: await getDb(), id });
  return user ? { id: user.id, email: user.email, name: user.name } : null;
}

type CurrentUserSource = () => Promise<CurrentUser | null>;
let currentUserSource: CurrentUserSource = userFromSession;

/** Who is signed in, or null. Route handlers, server components and actions all ask here. */
export function getCurrentUser(): Promise<CurrentUser | null> {
  return currentUserSource();
}

/**
 * Test seam: replace how the signed-in user is found (route handler tests run without
 * next-auth cookies). Pass null to restore the session lookup.
 */
export function setCurrentUserSource(source: CurrentUserSource | null): void {
  currentUserSource = source ?? userFromSession;
}
