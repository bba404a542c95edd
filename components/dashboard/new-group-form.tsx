"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { useCreateGroup } from "@/components/data/queries";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";

const groupSchema = z.object({
  name: z.string().trim().min(1, "Give the group a name.").max(120, "Use at most 120 characters."),
});

/** Anyone signed in may start a group and becomes its group lead. */
export function NewGroupForm() {
  const createGroup = useCreateGroup();
  const { register, handleSubmit, formState, reset } = useForm<z.infer<typeof groupSchema>>({ resolver: zodResolver(groupSchema) });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await createGroup.mutateAsync(values);
      reset();
    } catch {
      // The mutation keeps the error; it is shown below.
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Start a group">
      {createGroup.isError && <Notice kind="problem">{createGroup.error.message}</Notice>}
      {createGroup.isSuccess && <Notice kind="success">Group “{createGroup.data.name}” started; you are its group lead.</Notice>}
      <TextField label="Group name" error={formState.errors.name?.message} {...register("name")} />
      <Button type="submit" tone="quiet" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Starting…" : "Start the group"}
      </Button>
    </form>
  );
}
