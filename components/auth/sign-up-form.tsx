"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { ApiError, fetchJson } from "@/components/data/api-client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { emailField, newPasswordField } from "./fields";

const signUpSchema = z
  .object({
    name: z.string().trim().min(1, "Enter the name your co-authors will see.").max(100, "Use at most 100 characters."),
    email: emailField,
    password: newPasswordField,
    confirm: z.string(),
  })
  .refine((values) => values.password === values.confirm, { path: ["confirm"], message: "The two passwords differ." });
type SignUpValues = z.infer<typeof signUpSchema>;

export function SignUpForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignUpValues>({ resolver: zodResolver(signUpSchema) });

  const onSubmit = handleSubmit(async ({ name, email, password }) => {
    setProblem(null);
    try {
      await fetchJson("/api/auth/signup", { method: "POST", json: { name, email, password } });
      setSentTo(email);
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : "The account could not be created. Try again.");
    }
  });

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
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <TextField
        label="Repeat the password"
        type="password"
        autoComplete="new-password"
        error={formState.errors.confirm?.message}
        {...register("confirm")}
      />
      <div className="flex justify-end">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Creating…" : "Create the account"}
        </Button>
      </div>
    </form>
  );
}
