"use client";

import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "./api-client";
import type { Role } from "./roles";
import type { GroupDetail, GroupSummary, Member, NotebookPage, NotebookQuery, NotebookRow } from "./types";

/** Query keys in one place, so a mutation invalidates exactly what it changed. */
export const queryKeys = {
  groups: ["groups"] as const,
  group: (groupId: string) => ["groups", groupId] as const,
  members: (groupId: string) => ["groups", groupId, "members"] as const,
  notebooks: ["notebooks"] as const,
  notebookPage: (query: NotebookQuery) => ["notebooks", query] as const,
};

export function useGroups() {
  return useQuery({
    queryKey: queryKeys.groups,
    queryFn: async () => (await fetchJson<{ groups: GroupSummary[] }>("/api/groups")).groups,
  });
}

export function useGroup(groupId: string) {
  return useQuery({
    queryKey: queryKeys.group(groupId),
    queryFn: async () => (await fetchJson<{ group: GroupDetail }>(`/api/groups/${groupId}`)).group,
  });
}

export function useNotebookPage(query: NotebookQuery) {
  const params = new URLSearchParams({
    q: query.q,
    sort: query.sort,
    dir: query.dir,
    page: String(query.page),
    pageSize: String(query.pageSize),
  });
  return useQuery({
    queryKey: queryKeys.notebookPage(query),
    queryFn: () => fetchJson<NotebookPage>(`/api/notebooks?${params}`),
    // Keep the previous page on screen while the next one loads, so the table does not jump.
    placeholderData: keepPreviousData,
  });
}

export function useCreateGroup() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: { name: string; description?: string }) =>
      (await fetchJson<{ group: GroupSummary }>("/api/groups", { method: "POST", json: input })).group,
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.groups }),
  });
}

export function useCreateNotebook() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: { groupId: string; title: string }) =>
      (await fetchJson<{ notebook: NotebookRow }>("/api/notebooks", { method: "POST", json: input })).notebook,
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.notebooks }),
  });
}

export function useRenameNotebook(notebookId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (title: string) =>
      (await fetchJson<{ notebook: NotebookRow }>(`/api/notebooks/${notebookId}`, { method: "PATCH", json: { title } })).notebook,
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.notebooks }),
  });
}

export function useMembers(groupId: string) {
  return useQuery({
    queryKey: queryKeys.members(groupId),
    queryFn: async () => (await fetchJson<{ members: Member[] }>(`/api/groups/${groupId}/members`)).members,
  });
}

export function useAddMember(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { email: string; role: Role }) =>
      fetchJson<unknown>(`/api/groups/${groupId}/members`, { method: "POST", json: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.members(groupId) }),
  });
}

export function useChangeRole(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      fetchJson<unknown>(`/api/groups/${groupId}/members/${userId}`, { method: "PATCH", json: { role } }),
    onSettled: () => client.invalidateQueries({ queryKey: queryKeys.members(groupId) }),
  });
}

export function useRemoveMember(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => fetchJson<unknown>(`/api/groups/${groupId}/members/${userId}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.members(groupId) }),
  });
}
