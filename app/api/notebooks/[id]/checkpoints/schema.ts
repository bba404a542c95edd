import { z } from "zod";
import { idSchema } from "@/app/_server/parse";

export const checkpointsParams = z.object({ id: idSchema });
export const checkpointParams = z.object({ id: idSchema, cid: idSchema });
export const diffParams = z.object({ id: idSchema, cid: idSchema, other: idSchema });

export const saveCheckpointBody = z.strictObject({
  label: z.string().trim().min(1, "Give the checkpoint a label.").max(200, "Label: at most 200 characters."),
});
