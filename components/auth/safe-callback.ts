/** Keeps a post-sign-in destination on this site: only a path like "/notebooks/…", never "//host" or a full URL. */
export function safeCallbackUrl(value: string | string[] | undefined, fallback = "/dashboard"): string {
  const candidate = Array.isArray(value) ? value[0] : value;
  if (!candidate || !candidate.startsWith("/") || candidate.startsWith("//") || candidate.startsWith("/\\")) return fallback;
  return candidate;
}

/** next-auth reports failures as short codes in `?error=`; these are the words we show instead. No message says whether an account exists. */
export function describeSignInError(code: string | null | undefined): string | null {
  if (!code) return null;
  switch (code) {
    case "CredentialsSignin":
      return "That e-mail and password do not match an account we can sign in.";
    case "EmailSignin":
      return "We could not send the sign-in link. Try again in a moment.";
    case "Verification":
      return "That sign-in link has expired or was already used. Ask for a new one.";
    case "SessionRequired":
      return "Sign in to see that page.";
    case "AccessDenied":
      return "Signing in was refused for this account.";
    default:
      // Our authorize() may throw a sentence (rate limit, unverified e-mail); show it as written.
      return /\s/.test(code) ? code : "Signing in did not work. Try again.";
  }
}
