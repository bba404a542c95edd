import { z } from "zod";
import { signUpBody } from "../../auth/signup/schema";

// Tokens are 32 random bytes in base64url (43 characters); anything else cannot be one.
export const invitationTokenParams = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, "Not an invitation link.") });

/** Empty when signed in; a name and a password to make the account when the address has none yet. */
export const acceptInvitationBody = z.union([z.strictObject({}), signUpBody.pick({ name: true, password: true })], "Send nothing, or a name and a password.");
