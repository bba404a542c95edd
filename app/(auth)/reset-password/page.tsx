import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { ChoosePasswordForm, RequestResetForm } from "@/components/auth/password-reset-forms";

export const metadata: Metadata = { title: "Reset your password" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

export default async function ResetPasswordPage({ searchParams }: { searchParams: SearchParams }) {
  const params = await searchParams;
  const token = typeof params.token === "string" ? params.token : null;
  const email = typeof params.email === "string" ? params.email : null;
  return (
    <AuthCard
      title={token ? "Choose a new password" : "Reset your password"}
      lead={token ? undefined : "We will e-mail you a link to choose a new one."}
      footer={<Link href="/sign-in">Back to sign in</Link>}
    >
      {token ? <ChoosePasswordForm token={token} email={email} /> : <RequestResetForm />}
    </AuthCard>
  );
}
