import { z } from "zod";
import { idSchema } from "@/app/_server/parse";
import { roleField } from "../members/schema";

export const inviteBody = z.strictObject({
  email: z.email("Enter a valid e-mail address.").max(254),
  role: roleField,
});

export const invitationParams = z.object({ id: idSchema, invitationId: idSchema });
