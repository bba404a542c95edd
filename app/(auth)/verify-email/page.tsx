import type { Metadata } from "next";
import { AuthCard } from "@/components/auth/auth-card";
import { VerifyEmailStatus } from "@/components/auth/verify-email-status";
import { Notice } from "@/components/ui/notice";

export const metadata: Metadata = { title: "Confirm your e-mail" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

/** Opened from the confirmation e-mail (?token=…), or by next-auth after a sign-in link was sent (no token). */
export default async function VerifyEmailPage({ searchParams }: { searchParams: SearchParams }) {
  const params = await searchParams;
  const token = typeof params.token === "string" ? params.token : null;
  const email = typeof params.email === "string" ? params.email : null;
  return (
    <AuthCard title={token ? "Confirm your e-mail" : "Check your e-mail"}>
      {token ? (
        <VerifyEmailStatus token={token} email={email} />
      ) : (
        <Notice kind="info">We sent you a link. Open it in this browser to continue; it works once and expires soon.</Notice>
      )}
    </AuthCard>
  );
}
