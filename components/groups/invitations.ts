"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/components/data/api-client";
import type { Role } from "@/components/data/roles";

export type PendingInvitation = { id: string; email: string; role: Role; expiresAt: string; createdAt: string; invitedByName: string | null };

const invitationsKey = (groupId: string) => ["groups", groupId, "invitations"] as const;

export function useInvitations(groupId: string, enabled: boolean) {
  return useQuery({
    queryKey: invitationsKey(groupId),
    queryFn: async () => (await fetchJson<{ invitations: PendingInvitation[] }>(`/api/groups/${groupId}/invitations`)).invitations,
    enabled,
  });
}

export function useInvite(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: { email: string; role: Role }) =>
      (await fetchJson<{ invitation: PendingInvitation }>(`/api/groups/${groupId}/invitations`, { method: "POST", json: input })).invitation,
    onSuccess: () => client.invalidateQueries({ queryKey: invitationsKey(groupId) }),
  });
}

export function useWithdrawInvitation(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => fetchJson<unknown>(`/api/groups/${groupId}/invitations/${id}`, { method: "DELETE" }),
    onSettled: () => client.invalidateQueries({ queryKey: invitationsKey(groupId) }),
  });
}
