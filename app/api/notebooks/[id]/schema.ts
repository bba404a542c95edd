import { z } from "zod";
import { idSchema } from "@/app/_server/parse";
import { summaryField, titleField } from "../schema";

export const notebookParams = z.object({ id: idSchema });

export const updateNotebookBody = z
  .strictObject({ title: titleField.optional(), summary: summaryField.optional() })
  .refine((body) => body.title !== undefined || body.summary !== undefined, "Send a title or a summary to change.");
