import { z } from "zod";
import { idSchema } from "@/app/_server/parse";
import { remarkBodyField } from "../../notebooks/[id]/remarks/schema";

export const remarkParams = z.object({ id: idSchema });

export const changeRemarkBody = z.discriminatedUnion(
  "action",
  [
    z.strictObject({ action: z.literal("reply"), body: remarkBodyField }),
    z.strictObject({ action: z.literal("settle") }),
    z.strictObject({ action: z.literal("reopen") }),
  ],
  "action: reply (with body), settle or reopen.",
);
