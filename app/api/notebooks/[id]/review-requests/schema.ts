import { z } from "zod";
import { idSchema } from "@/app/_server/parse";

export const reviewRequestParams = z.object({ id: idSchema });

export const reviewRequestBody = z.strictObject({
  reviewerId: z.uuid("reviewerId: choose a reviewer of the group."),
  message: z.string().trim().max(2000, "message: at most 2000 characters.").default(""),
});
