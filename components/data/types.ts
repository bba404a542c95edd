import type { Role } from "./roles";

// The JSON shapes of our API as the interface uses them. Dates arrive as ISO strings.

export type GroupSummary = {
  id: string;
  name: string;
  description: string;
  role: Role;
  memberCount?: number;
};

export type NotebookRow = {
  id: string;
  title: string;
  summary?: string;
  groupId: string;
  groupName: string;
  role: Role;
  updatedAt: string;
  createdAt?: string;
};

export type NotebookPage = {
  items: NotebookRow[];
  total: number;
  page: number;
  pageSize: number;
};

export type NotebookSortKey = "title" | "group" | "updatedAt";

export type NotebookQuery = {
  q: string;
  sort: NotebookSortKey;
  dir: "asc" | "desc";
  page: number;
  pageSize: number;
};

export type Member = {
  userId: string;
  name: string;
  email: string;
  role: Role;
};

export type GroupDetail = {
  id: string;
  name: string;
  description: string;
  role: Role;
};
