import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/app/_server/auth";
import { AuthCard } from "@/components/auth/auth-card";
import { safeCallbackUrl } from "@/components/auth/safe-callback";
import { SignInForm } from "@/components/auth/sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

export default async function SignInPage({ searchParams }: { searchParams: SearchParams }) {
  const params = await searchParams;
  const callbackUrl = safeCallbackUrl(params.callbackUrl);
  if (await getCurrentUser()) redirect(callbackUrl);
  const error = typeof params.error === "string" ? params.error : null;
  return (
    <AuthCard
      title="Sign in"
      lead="Open your group's notebooks."
      footer={
        <>
          New here? <Link href="/sign-up">Create an account</Link>
        </>
      }
    >
      <SignInForm callbackUrl={callbackUrl} initialError={error} />
    </AuthCard>
  );
}
