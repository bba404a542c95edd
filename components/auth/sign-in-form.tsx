"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { describeSignInError } from "./safe-callback";
import { emailField } from "./fields";
import { SubmitButton, SubmitRow } from "./submit-button";
import { useCsrfReady } from "./use-csrf-ready";

const passwordSchema = z.object({ email: emailField, password: z.string().min(1, "Enter your password.") });
const linkSchema = z.object({ email: emailField });
type PasswordValues = z.infer<typeof passwordSchema>;
type LinkValues = z.infer<typeof linkSchema>;

type Mode = "password" | "link";

export function SignInForm({ callbackUrl, initialError }: { callbackUrl: string; initialError: string | null }) {
  const [mode, setMode] = useState<Mode>("password");
  const csrfReady = useCsrfReady();
  return (
    <div className="space-y-5">
      <fieldset className="flex gap-1 rounded-md border border-paper-edge bg-paper-deep p-1 text-sm">
        <legend className="sr-only">How do you want to sign in?</legend>
        <ModeOption mode="password" current={mode} onChange={setMode} label="With a password" />
        <ModeOption mode="link" current={mode} onChange={setMode} label="With an e-mailed link" />
      </fieldset>
      {mode === "password" ? (
        <PasswordForm callbackUrl={callbackUrl} initialError={initialError} csrfReady={csrfReady} />
      ) : (
        <LinkForm callbackUrl={callbackUrl} csrfReady={csrfReady} />
      )}
    </div>
  );
}

function ModeOption({ mode, current, onChange, label }: { mode: Mode; current: Mode; onChange: (mode: Mode) => void; label: string }) {
  const checked = mode === current;
  return (
    <label
      className={`flex-1 cursor-pointer rounded px-3 py-1.5 text-center has-[:focus-visible]:outline has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-accent ${
        checked ? "bg-white font-medium text-ink shadow-sm" : "text-ink-soft"
      }`}
    >
      <input type="radio" name="sign-in-mode" value={mode} checked={checked} onChange={() => onChange(mode)} className="sr-only" />
      {label}
    </label>
  );
}

function PasswordForm({ callbackUrl, initialError, csrfReady }: { callbackUrl: string; initialError: string | null; csrfReady: boolean }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(describeSignInError(initialError));
  const { register, handleSubmit, formState } = useForm<PasswordValues>({ resolver: zodResolver(passwordSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setProblem(null);
    const result = await signIn("credentials", { ...values, redirect: false, callbackUrl });
    if (!result || result.error || !result.ok) {
      setProblem(describeSignInError(result?.error ?? "CredentialsSignin"));
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice kind="problem">{problem}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <div className="flex items-center justify-between gap-3">
        <Link href="/reset-password" className="text-sm">
          Forgot your password?
        </Link>
        <SubmitButton sending={formState.isSubmitting} disabled={!csrfReady} label="Sign in" sendingLabel="Signing in…" />
      </div>
    </form>
  );
}

function LinkForm({ callbackUrl, csrfReady }: { callbackUrl: string; csrfReady: boolean }) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<LinkValues>({ resolver: zodResolver(linkSchema) });

  const onSubmit = handleSubmit(async ({ email }) => {
    setProblem(null);
    const result = await signIn("email", { email, redirect: false, callbackUrl });
    if (!result || result.error) {
      setProblem(describeSignInError(result?.error ?? "EmailSignin"));
      return;
    }
    setSentTo(email);
  });

  if (sentTo) {
    return (
      <Notice kind="success">
        If <strong>{sentTo}</strong> belongs to an account, a sign-in link is on its way. It works once and expires soon.
      </Notice>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice kind="problem">{problem}</Notice>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        hint="We will send a link that signs you in without a password."
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <SubmitRow sending={formState.isSubmitting} disabled={!csrfReady} label="Send the sign-in link" sendingLabel="Sending…" />
    </form>
  );
}
