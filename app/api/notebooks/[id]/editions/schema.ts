import { z } from "zod";
import { idSchema } from "@/app/_server/parse";

export const editionsParams = z.object({ id: idSchema });
export const editionParams = z.object({
  id: idSchema,
  number: z.coerce.number({ message: "Edition number: a whole number from 1." }).int("Edition number: a whole number from 1.").min(1, "Edition number: a whole number from 1.").max(1_000_000),
});

export const publishEditionBody = z.strictObject({
  reason: z.string().trim().max(2000, "Reason: at most 2000 characters.").optional(),
});
