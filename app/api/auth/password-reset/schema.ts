import { z } from "zod";
import { passwordRules } from "@/app/_server/passwords";

/** Either a request for a link ({email}) or the new password with the link's token. */
export const passwordResetBody = z.union([
  z.strictObject({
    token: z.string().min(1).max(200),
    password: z
      .string()
      .min(passwordRules.min, `At least ${passwordRules.min} characters.`)
      .max(passwordRules.max, `At most ${passwordRules.max} characters.`),
    email: z.string().max(254).optional(),
  }),
  z.strictObject({ email: z.email("Enter a valid e-mail address.").max(254) }),
]);
