import { z } from "zod";

// Client-side checks mirror what the server will enforce, so most mistakes are caught before a round trip.
export const emailField = z.string().trim().min(1, "Enter your e-mail address.").max(254, "That address is too long.").email("Enter an e-mail address like name@example.org.");
export const newPasswordField = z
  .string()
  .min(8, "Use at least 8 characters.")
  .max(72, "Use at most 72 characters.");
