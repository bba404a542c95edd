import { z } from "zod";
import { notebookSortKeys } from "@/db/queries/notebooks";

export const listNotebooksQuery = z.strictObject({
  q: z.string().max(200, "Search text: at most 200 characters.").optional(),
  sort: z.enum(notebookSortKeys).optional(),
  dir: z.enum(["asc", "desc"]).optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
  groupId: z.uuid("groupId: not a valid id.").optional(),
});

export const titleField = z.string().trim().min(1, "Give the notebook a title.").max(200, "Title: at most 200 characters.");
export const summaryField = z.string().trim().max(2000, "Summary: at most 2000 characters.");

export const createNotebookBody = z.strictObject({
  groupId: z.uuid("groupId: not a valid id."),
  title: titleField,
  summary: summaryField.optional(),
});
