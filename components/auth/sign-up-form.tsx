"use client";

import { zodResolver } from "@hookform/resolvers/zod";
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

const signUpSchema = repeatMustMatch(
  z.object({
    name: z.string().trim().min(1, "Enter the name your co-authors will see.").max(100, "Use at most 100 characters."),
    email: emailField,
    ...newPasswordTwice,
  }),
);
type SignUpValues = z.infer<typeof signUpSchema>;

export function SignUpForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { problem, attempt } = useApiProblem("The account could not be created. Try again.");
  const { register, handleSubmit, formState } = useForm<SignUpValues>({ resolver: zodResolver(signUpSchema) });

  const onSubmit = handleSubmit(({ name, email, password }) =>
    attempt(async () => {
      await fetchJson("/api/auth/signup", { method: "POST", json: { name, email, password } });
      setSentTo(email);
    }),
  );

  if (sentTo) {
    return (
      <Notice kind="success">
        Check <strong>{sentTo}</strong> for a message from Vierbein and follow its link to confirm the address. Then sign in.
      </Notice>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {problem && <Notice kind="problem">{problem}</Notice>}
      <TextField label="Name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <NewPasswordFields
        password={{ label: "Password", registration: register("password"), error: formState.errors.password }}
        confirm={{ label: "Repeat the password", registration: register("confirm"), error: formState.errors.confirm }}
      />
      <SubmitRow sending={formState.isSubmitting} label="Create the account" sendingLabel="Creating…" />
    </form>
  );
}
