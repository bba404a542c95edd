import { z } from "zod";

// Client-side checks mirror what the server will enforce, so most mistakes are caught before a round trip.
export const emailField = z.string().trim().min(1, "Enter your e-mail address.").max(254, "That address is too long.").email("Enter an e-mail address like name@example.org.");
export const newPasswordField = z
  .string()
  .min(8, "Use at least 8 characters.")
  .max(72, "Use at most 72 characters.");

/** A new password typed twice; spread it into a form's fields and wrap the form's schema in `repeatMustMatch`. */
export const newPasswordTwice = { password: newPasswordField, confirm: z.string() };

/** A form with `newPasswordTwice` whose repeat differs is refused, with the mismatch reported on the repeat. */
export function repeatMustMatch<Output extends { password: string; confirm: string }, Input>(schema: z.ZodType<Output, Input>) {
  return schema.refine((values) => values.password === values.confirm, { path: ["confirm"], message: "The two passwords differ." });
}
