import type { FieldError, UseFormRegisterReturn } from "react-hook-form";
import { TextField } from "@/components/ui/text-field";

type Field = { label: string; registration: UseFormRegisterReturn; error?: FieldError };

/** A new password and its repeat, as the sign-up and reset forms ask for them; the labels are each form's own. */
export function NewPasswordFields({ password, confirm }: { password: Field; confirm: Field }) {
  return (
    <>
      <TextField
        label={password.label}
        type="password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={password.error?.message}
        {...password.registration}
      />
      <TextField label={confirm.label} type="password" autoComplete="new-password" error={confirm.error?.message} {...confirm.registration} />
    </>
  );
}
