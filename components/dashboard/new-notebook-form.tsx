"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { useCreateNotebook } from "@/components/data/queries";
import type { GroupSummary } from "@/components/data/types";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { TextField } from "@/components/ui/text-field";

const notebookSchema = z.object({
  title: z.string().trim().min(1, "Give the notebook a title.").max(200, "Use at most 200 characters."),
  groupId: z.string().min(1, "Choose a group."),
});

/** Shown only to people who are an author or group lead somewhere; `groups` holds just those groups. */
export function NewNotebookForm({ groups, onCancel }: { groups: GroupSummary[]; onCancel: () => void }) {
  const router = useRouter();
  const createNotebook = useCreateNotebook();
  const { register, handleSubmit, formState } = useForm<z.infer<typeof notebookSchema>>({
    resolver: zodResolver(notebookSchema),
    defaultValues: { title: "", groupId: groups[0]?.id ?? "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      const notebook = await createNotebook.mutateAsync(values);
      router.push(`/notebooks/${notebook.id}`);
    } catch {
      // Shown from the mutation's error below.
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="New notebook" className="space-y-4 rounded-lg border border-accent bg-accent-wash/50 p-4">
      {createNotebook.isError && <Notice kind="problem">{createNotebook.error.message}</Notice>}
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <TextField label="Notebook title" autoFocus error={formState.errors.title?.message} {...register("title")} />
        <SelectField
          label="Group"
          error={formState.errors.groupId?.message}
          options={groups.map((group) => ({ value: group.id, label: group.name }))}
          {...register("groupId")}
        />
      </div>
      <div className="flex gap-2">
        <Button type="submit" disabled={formState.isSubmitting || createNotebook.isSuccess}>
          {formState.isSubmitting || createNotebook.isSuccess ? "Creating…" : "Create the notebook"}
        </Button>
        <Button tone="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
