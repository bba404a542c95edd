import { z } from "zod";
import { idSchema } from "@/app/_server/parse";

export const exportParams = z.object({ id: idSchema });
export const exportQuery = z.strictObject({
  format: z.literal("tex", "format: only tex is offered."),
  edition: z.coerce.number({ message: "edition: a whole number from 1." }).int("edition: a whole number from 1.").min(1, "edition: a whole number from 1.").optional(),
});
