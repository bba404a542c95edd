import { z } from "zod";
import { idSchema } from "@/app/_server/parse";

export const attachmentParams = z.object({ id: idSchema });

export const placeFigureBody = z.strictObject({
  caption: z.string().trim().max(500, "Caption: at most 500 characters.").optional(),
});
