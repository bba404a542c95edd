import { z } from "zod";
import { idSchema } from "@/app/_server/parse";

export const attachmentsParams = z.object({ id: idSchema });
