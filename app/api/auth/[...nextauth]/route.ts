// next-auth's own endpoints: /api/auth/csrf, /session, /signin/:provider, /callback/:provider, /signout, …
// Providers: "credentials" (email + password) and "email" (magic link). A failed password
// sign-in answers error "CredentialsSignin"; a paused or unconfirmed account answers a sentence.
import NextAuth from "next-auth";
import { authOptions } from "@/app/_server/auth";

const handler = NextAuth(authOptions);

export { handler as GET, handler as POST };
