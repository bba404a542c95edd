"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useId } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { ApiError, fetchJson } from "@/components/data/api-client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

type AttachmentRow = { id: string; fileName: string; contentType: string; size: number; uploadedByName: string | null; createdAt: string; url: string; figure: boolean };

const MAX_BYTES = 10 * 1024 * 1024;

// The browser's checks are a courtesy; the server decides the type from the bytes themselves.
const uploadSchema = z.object({
  file: z
    .custom<FileList>((value) => typeof FileList !== "undefined" && value instanceof FileList, "Choose a file.")
    .refine((files) => files.length === 1, "Choose one file.")
    .refine((files) => files[0]?.size <= MAX_BYTES, "The file is larger than 10 MB.")
    .refine((files) => files[0]?.size > 0, "The file is empty."),
});
type UploadValues = z.infer<typeof uploadSchema>;

const sizeText = (bytes: number) => (bytes < 1024 * 1024 ? `${Math.max(1, Math.round(bytes / 1024))} KB` : `${(bytes / 1024 / 1024).toFixed(1)} MB`);

/** Upload figures and data, download them, and place a figure in the notebook. */
export function AttachmentSection({ notebookId, canWrite }: { notebookId: string; canWrite: boolean }) {
  const client = useQueryClient();
  const titleId = useId();
  const fileId = useId();
  const key = ["attachments", notebookId];
  const list = useQuery({ queryKey: key, queryFn: () => fetchJson<{ attachments: AttachmentRow[] }>(`/api/notebooks/${notebookId}/attachments`) });
  const form = useForm<UploadValues>({ resolver: zodResolver(uploadSchema) });
  const upload = useMutation({
    mutationFn: async (values: UploadValues) => {
      const body = new FormData();
      body.set("file", values.file[0]);
      const response = await fetch(`/api/notebooks/${notebookId}/attachments`, { method: "POST", body });
      const json = await response.json().catch(() => null);
      if (!response.ok) throw new ApiError(json?.error?.message ?? `The server answered ${response.status}.`, response.status);
      return json;
    },
    onSuccess: () => {
      form.reset();
      void client.invalidateQueries({ queryKey: key });
    },
  });
  const place = useMutation({
    mutationFn: (id: string) => fetchJson(`/api/attachments/${id}/figure`, { method: "POST", json: {} }),
  });
  // Removal cannot be undone, so the browser asks first; the server refuses what a figure or an edition shows.
  const remove = useMutation({
    mutationFn: (attachment: AttachmentRow) => fetchJson(`/api/attachments/${attachment.id}`, { method: "DELETE" }),
    onSuccess: () => void client.invalidateQueries({ queryKey: key }),
  });
  const confirmRemove = (attachment: AttachmentRow) => {
    if (window.confirm(`Remove ${attachment.fileName}? Its file is deleted; this cannot be undone.`)) remove.mutate(attachment);
  };
  const fileError = form.formState.errors.file?.message;

  return (
    <section aria-labelledby={titleId} className="space-y-3">
      <h2 id={titleId} className="font-serif text-xl font-semibold">
        Attachments
      </h2>
      {canWrite && (
        <form onSubmit={form.handleSubmit((values) => upload.mutate(values))} className="flex flex-wrap items-end gap-2" noValidate>
          <div className="flex flex-col gap-1">
            <label htmlFor={fileId} className="text-xs font-medium text-ink-soft">
              Figure (PNG, JPEG, PDF) or data (CSV), up to 10 MB
            </label>
            <input
              id={fileId}
              type="file"
              accept=".png,.jpg,.jpeg,.pdf,.csv,image/png,image/jpeg,application/pdf,text/csv"
              aria-invalid={fileError ? true : undefined}
              aria-describedby={fileError ? `${fileId}-error` : undefined}
              className="text-sm"
              {...form.register("file")}
            />
            {fileError && (
              <p id={`${fileId}-error`} className="text-sm text-alarm">
                {fileError}
              </p>
            )}
          </div>
          <Button type="submit" disabled={upload.isPending}>
            {upload.isPending ? "Uploading…" : "Upload"}
          </Button>
        </form>
      )}
      {upload.isError && <Notice kind="problem">{upload.error.message}</Notice>}
      {upload.isSuccess && <Notice kind="success">Uploaded.</Notice>}
      {place.isError && <Notice kind="problem">{place.error.message}</Notice>}
      {remove.isError && <Notice kind="problem">{remove.error.message}</Notice>}
      {remove.isSuccess && <Notice kind="success">Removed {remove.variables.fileName}.</Notice>}
      {place.isSuccess && <Notice kind="success">The figure is placed at the end of the notebook; drag it where it belongs.</Notice>}
      {list.isError ? (
        <Notice kind="problem">{list.error.message}</Notice>
      ) : (
        <ul className="space-y-1 text-sm">
          {(list.data?.attachments ?? []).map((a) => (
            <li key={a.id} className="flex flex-wrap items-center gap-2">
              <a href={a.url}>{a.fileName}</a>
              <span className="text-xs text-ink-muted">
                {a.figure ? "figure" : "data"} · {sizeText(a.size)} · {a.uploadedByName ?? "someone"}
              </span>
              {canWrite && a.figure && (
                <Button tone="quiet" className="!px-2 !py-0.5 text-xs" disabled={place.isPending} onClick={() => place.mutate(a.id)}>
                  Place in the notebook<span className="sr-only">: {a.fileName}</span>
                </Button>
              )}
              {canWrite && (
                <Button tone="quiet" className="!px-2 !py-0.5 text-xs" disabled={remove.isPending} onClick={() => confirmRemove(a)}>
                  Remove<span className="sr-only">: {a.fileName}</span>
                </Button>
              )}
            </li>
          ))}
          {list.data?.attachments.length === 0 && <li className="text-ink-muted">No attachments yet.</li>}
        </ul>
      )}
    </section>
  );
}
