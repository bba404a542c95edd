"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/components/data/api-client";

export type RemarkPerson = { id: string; name: string; email: string };
export type RemarkAnchor = { stepId?: string; span?: { from: string; to: string }; quote?: string };
export type RemarkThread = {
  id: string;
  anchor: RemarkAnchor;
  body: string;
  author: RemarkPerson | null;
  settled: boolean;
  settledBy: RemarkPerson | null;
  settledAt: string | null;
  createdAt: string;
  updatedAt: string;
  replies: { id: string; body: string; author: RemarkPerson | null; createdAt: string }[];
};
type RemarkList = { threads: RemarkThread[]; permissions: { remark: boolean; settle: boolean } };

const remarksKey = (notebookId: string) => ["notebooks", notebookId, "remarks"] as const;

/** Every thread of the notebook (filtering, sorting and paging happen in the side list). */
export function useRemarks(notebookId: string) {
  return useQuery({
    queryKey: remarksKey(notebookId),
    queryFn: () => fetchJson<RemarkList>(`/api/notebooks/${notebookId}/remarks`),
    // Co-reviewers' remarks arrive without a reload.
    refetchInterval: 20_000,
  });
}

export function useCreateRemark(notebookId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: { body: string; anchor: RemarkAnchor }) =>
      (await fetchJson<{ thread: RemarkThread }>(`/api/notebooks/${notebookId}/remarks`, { method: "POST", json: input })).thread,
    onSuccess: () => client.invalidateQueries({ queryKey: remarksKey(notebookId) }),
  });
}

export function useChangeRemark(notebookId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, ...change }: { id: string } & ({ action: "reply"; body: string } | { action: "settle" | "reopen" })) =>
      (await fetchJson<{ thread: RemarkThread }>(`/api/remarks/${id}`, { method: "PATCH", json: change })).thread,
    onSettled: () => client.invalidateQueries({ queryKey: remarksKey(notebookId) }),
  });
}
