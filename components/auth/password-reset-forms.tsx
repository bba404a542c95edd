"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { ApiError, fetchJson } from "@/components/data/api-client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { emailField, newPasswordField } from "./fields";

const requestSchema = z.object({ email: emailField });
const chooseSchema = z
  .object({ password: newPasswordField, confirm: z.string() })
  .refine((values) => values.password === values.confirm, { path: ["confirm"], message: "The two passwords differ." });

function messageOf(error: unknown, fallback: string): string {
  return error instanceof ApiError ? error.message : fallback;
}

/** Step one: ask for a reset link. The answer is the same whether or not the address has an account. */
export function RequestResetForm({ initialEmail = "" }: { initialEmail?: string }) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<z.infer<typeof requestSchema>>({
    resolver: zodResolver(requestSchema),
    defaultValues: { email: initialEmail },
  });

  const onSubmit = handleSubmit(async ({ email }) => {
    setProblem(null);
    try {
      await fetchJson("/api/auth/password-reset", { method: "POST", json: { email } });
      setSentTo(email);
    } catch (error) {
      setProblem(messageOf(error, "The request could not be sent. Try again."));
    }
  });

  if (sentTo)
    return (
      <Notice kind="success">
        If <strong>{sentTo}</strong> belongs to an account, a link to choose a new password is on its way.
      </Notice>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice kind="problem">{problem}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <div className="flex justify-end">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Sending…" : "Send the reset link"}
        </Button>
      </div>
    </form>
  );
}

/** Step two, opened from the e-mailed link: choose the new password. */
export function ChoosePasswordForm({ token, email }: { token: string; email: string | null }) {
  const [done, setDone] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<z.infer<typeof chooseSchema>>({ resolver: zodResolver(chooseSchema) });

  const onSubmit = handleSubmit(async ({ password }) => {
    setProblem(null);
    try {
      await fetchJson("/api/auth/password-reset", { method: "POST", json: email ? { token, email, password } : { token, password } });
      setDone(true);
    } catch (error) {
      setProblem(messageOf(error, "The password could not be changed. Ask for a new link."));
    }
  });

  if (done)
    return (
      <div className="space-y-3">
        <Notice kind="success">Your password is changed.</Notice>
        <p>
          <Link href="/sign-in">Sign in</Link> with the new password.
        </p>
      </div>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice kind="problem">{problem}</Notice>}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <TextField
        label="Repeat the new password"
        type="password"
        autoComplete="new-password"
        error={formState.errors.confirm?.message}
        {...register("confirm")}
      />
      <div className="flex justify-end">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : "Set the new password"}
        </Button>
      </div>
    </form>
  );
}
