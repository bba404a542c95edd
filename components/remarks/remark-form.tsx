"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useId } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Button } from "@/components/ui/button";

// Mirrors the server's rule (app/api/notebooks/[id]/remarks/schema.ts), so most mistakes never leave the page.
const remarkSchema = z.object({
  body: z.string().trim().min(1, "Write the remark first.").max(4000, "A remark holds at most 4000 characters."),
});

/** A remark or a reply: one text area, a submit button, and the error beside the field. */
export function RemarkForm({
  label,
  submitLabel,
  formLabel,
  onSubmit,
  onCancel,
  problem,
}: {
  label: string;
  submitLabel: string;
  formLabel: string;
  onSubmit: (body: string) => Promise<unknown>;
  onCancel?: () => void;
  problem?: string | null;
}) {
  const fieldId = useId();
  const { register, handleSubmit, formState, reset } = useForm<z.infer<typeof remarkSchema>>({
    resolver: zodResolver(remarkSchema),
    defaultValues: { body: "" },
  });
  const error = formState.errors.body?.message;

  const submit = handleSubmit(async ({ body }) => {
    try {
      await onSubmit(body);
      reset({ body: "" });
    } catch {
      // The caller shows the server's message through `problem`.
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label={formLabel} className="space-y-2">
      <label htmlFor={fieldId} className="block text-sm font-medium">
        {label}
      </label>
      <textarea
        id={fieldId}
        rows={3}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fieldId}-error` : undefined}
        className="w-full rounded-md border border-paper-edge bg-white/70 px-2 py-1.5 text-sm aria-[invalid=true]:border-alarm"
        {...register("body")}
      />
      {error && (
        <p id={`${fieldId}-error`} className="text-sm text-alarm">
          {error}
        </p>
      )}
      {problem && (
        <p role="alert" className="text-sm text-alarm">
          Problem: {problem}
        </p>
      )}
      <div className="flex gap-2">
        <Button type="submit" className="px-3 py-1" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Sending…" : submitLabel}
        </Button>
        {onCancel && (
          <Button tone="quiet" className="px-3 py-1" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
