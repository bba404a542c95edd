import { z } from "zod";
import { passwordRules } from "@/app/_server/passwords";

export const signUpBody = z.strictObject({
  name: z.string().trim().min(1, "Enter your name.").max(100, "At most 100 characters."),
  email: z.email("Enter a valid e-mail address.").max(254),
  password: z
    .string()
    .min(passwordRules.min, `At least ${passwordRules.min} characters.`)
    .max(passwordRules.max, `At most ${passwordRules.max} characters.`),
});
