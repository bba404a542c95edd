"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { fetchJson } from "@/components/data/api-client";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { emailField, newPasswordTwice, repeatMustMatch } from "./fields";
import { NewPasswordFields } from "./new-password-fields";
import { SubmitRow } from "./submit-button";
import { useApiProblem } from "./use-api-problem";

const requestSchema = z.object({ email: emailField });
const chooseSchema = repeatMustMatch(z.object(newPasswordTwice));

/** Step one: ask for a reset link. The answer is the same whether or not the address has an account. */
export function RequestResetForm({ initialEmail = "" }: { initialEmail?: string }) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { problem, attempt } = useApiProblem("The request could not be sent. Try again.");
  const { register, handleSubmit, formState } = useForm<z.infer<typeof requestSchema>>({
    resolver: zodResolver(requestSchema),
    defaultValues: { email: initialEmail },
  });

  const onSubmit = handleSubmit(({ email }) =>
    attempt(async () => {
      await fetchJson("/api/auth/password-reset", { method: "POST", json: { email } });
      setSentTo(email);
    }),
  );

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
      <SubmitRow sending={formState.isSubmitting} label="Send the reset link" sendingLabel="Sending…" />
    </form>
  );
}

/** Step two, opened from the e-mailed link: choose the new password. */
export function ChoosePasswordForm({ token, email }: { token: string; email: string | null }) {
  const [done, setDone] = useState(false);
  const { problem, attempt } = useApiProblem("The password could not be changed. Ask for a new link.");
  const { register, handleSubmit, formState } = useForm<z.infer<typeof chooseSchema>>({ resolver: zodResolver(chooseSchema) });

  const onSubmit = handleSubmit(({ password }) =>
    attempt(async () => {
      await fetchJson("/api/auth/password-reset", { method: "POST", json: email ? { token, email, password } : { token, password } });
      setDone(true);
    }),
  );

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
      <NewPasswordFields
        password={{ label: "New password", registration: register("password"), error: formState.errors.password }}
        confirm={{ label: "Repeat the new password", registration: register("confirm"), error: formState.errors.confirm }}
      />
      <SubmitRow sending={formState.isSubmitting} label="Set the new password" sendingLabel="Saving…" />
    </form>
  );
}
