import { z } from "zod";

export const createGroupBody = z.strictObject({
  name: z.string().trim().min(1, "Give the group a name.").max(120, "Name: at most 120 characters."),
  description: z.string().trim().max(2000, "Description: at most 2000 characters.").optional(),
});
