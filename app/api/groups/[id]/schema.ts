import { z } from "zod";
import { idSchema } from "@/app/_server/parse";

export const groupParams = z.object({ id: idSchema });
