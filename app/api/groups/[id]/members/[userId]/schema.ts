import { z } from "zod";
import { idSchema } from "@/app/_server/parse";
import { roleField } from "../schema";

export const memberParams = z.object({ id: idSchema, userId: idSchema });

export const changeRoleBody = z.strictObject({ role: roleField });
