"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { fetchJson } from "@/components/data/api-client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";

type Reviewer = { userId: string; name: string; email: string };

const requestSchema = z.object({
  reviewerId: z.string().min(1, "Choose a reviewer."),
  message: z.string().trim().max(2000, "At most 2000 characters."),
});

/** For authors and leads: ask one of the group's reviewers to review this notebook (they are mailed). */
export function ReviewRequestForm({ notebookId }: { notebookId: string }) {
  const reviewers = useQuery({
    queryKey: ["notebooks", notebookId, "reviewers"],
    queryFn: async () => (await fetchJson<{ reviewers: Reviewer[] }>(`/api/notebooks/${notebookId}/review-requests`)).reviewers,
  });
  const send = useMutation({
    mutationFn: (input: z.infer<typeof requestSchema>) => fetchJson<unknown>(`/api/notebooks/${notebookId}/review-requests`, { method: "POST", json: input }),
  });
  const { register, handleSubmit, formState, reset } = useForm<z.infer<typeof requestSchema>>({
    resolver: zodResolver(requestSchema),
    defaultValues: { reviewerId: "", message: "" },
  });

  if (reviewers.isSuccess && reviewers.data.length === 0) {
    return <p className="text-xs text-ink-muted">The group has no reviewers yet; a group lead can invite one from the group’s page.</p>;
  }

  const onSubmit = handleSubmit(async (values) => {
    try {
      await send.mutateAsync(values);
      reset({ reviewerId: "", message: "" });
    } catch {
      // Shown from the mutation's error below.
    }
  });

  return (
    <details className="rounded-md border border-paper-edge p-3">
      <summary className="cursor-pointer text-sm font-medium">Ask for a review</summary>
      <form onSubmit={onSubmit} noValidate aria-label="Ask for a review" className="mt-2 space-y-2">
        {send.isError && <Notice kind="problem">{send.error.message}</Notice>}
        {send.isSuccess && <Notice kind="success">Request sent; the reviewer was mailed a link.</Notice>}
        <SelectField
          label="Reviewer"
          error={formState.errors.reviewerId?.message}
          options={[{ value: "", label: "Choose…" }, ...(reviewers.data ?? []).map((r) => ({ value: r.userId, label: r.name || r.email }))]}
          {...register("reviewerId")}
        />
        <label className="block text-sm font-medium">
          Message (optional)
          <textarea rows={2} className="mt-1 w-full rounded-md border border-paper-edge bg-white/70 px-2 py-1.5 text-sm font-normal" {...register("message")} />
        </label>
        {formState.errors.message ? <p className="text-sm text-alarm">{formState.errors.message.message}</p> : null}
        <Button type="submit" className="px-3 py-1" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Sending…" : "Send the request"}
        </Button>
      </form>
    </details>
  );
}
