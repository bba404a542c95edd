"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { emailField } from "@/components/auth/fields";
import { ApiError } from "@/components/data/api-client";
import { useAddMember } from "@/components/data/queries";
import { roleLabels, roles } from "@/components/data/roles";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { TextField } from "@/components/ui/text-field";
import { useInvite } from "./invitations";

const memberSchema = z.object({ email: emailField, role: z.enum(roles) });

/**
 * Adds someone who has an account at once; anyone else is mailed an invitation with the
 * chosen role instead (the members route answers not_found:user for them).
 */
export function AddMemberForm({ groupId }: { groupId: string }) {
  const addMember = useAddMember(groupId);
  const invite = useInvite(groupId);
  const [outcome, setOutcome] = useState<string | null>(null);
  const { register, handleSubmit, formState, reset } = useForm<z.infer<typeof memberSchema>>({
    resolver: zodResolver(memberSchema),
    defaultValues: { email: "", role: "author" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setOutcome(null);
    invite.reset();
    try {
      await addMember.mutateAsync(values);
      setOutcome("Member added.");
      reset({ email: "", role: values.role });
    } catch (error) {
      if (!(error instanceof ApiError && error.code === "not_found:user")) return; // shown from the mutation's error below
      addMember.reset();
      try {
        await invite.mutateAsync(values);
        setOutcome(`No account uses ${values.email} yet, so we e-mailed an invitation to join as ${roleLabels[values.role]}.`);
        reset({ email: "", role: values.role });
      } catch {
        // Shown from the invitation's error below.
      }
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a member" className="space-y-3">
      {addMember.isError && <Notice kind="problem">{addMember.error.message}</Notice>}
      {invite.isError && <Notice kind="problem">{invite.error.message}</Notice>}
      {outcome && <Notice kind="success">{outcome}</Notice>}
      <div className="grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-end">
        <TextField label="Member's e-mail" type="email" error={formState.errors.email?.message} {...register("email")} />
        <SelectField label="Role" options={roles.map((role) => ({ value: role, label: roleLabels[role] }))} {...register("role")} />
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Adding…" : "Add"}
        </Button>
      </div>
    </form>
  );
}
