"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { emailField } from "@/components/auth/fields";
import { useAddMember } from "@/components/data/queries";
import { roleLabels, roles } from "@/components/data/roles";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { TextField } from "@/components/ui/text-field";

const memberSchema = z.object({ email: emailField, role: z.enum(roles) });

export function AddMemberForm({ groupId }: { groupId: string }) {
  const addMember = useAddMember(groupId);
  const { register, handleSubmit, formState, reset } = useForm<z.infer<typeof memberSchema>>({
    resolver: zodResolver(memberSchema),
    defaultValues: { email: "", role: "author" },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await addMember.mutateAsync(values);
      reset({ email: "", role: values.role });
    } catch {
      // Shown from the mutation's error below.
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a member" className="space-y-3">
      {addMember.isError && <Notice kind="problem">{addMember.error.message}</Notice>}
      {addMember.isSuccess && <Notice kind="success">Member added.</Notice>}
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
