import { z } from "zod";
import { roles } from "@/app/_server/authz";

export const roleField = z.enum(roles, "role: one of lead, author, reviewer, reader.");

export const addMemberBody = z.strictObject({
  email: z.email("Enter a valid e-mail address.").max(254),
  role: roleField,
});
