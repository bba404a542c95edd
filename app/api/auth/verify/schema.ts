import { z } from "zod";

export const verifyBody = z.strictObject({
  token: z.string().min(1).max(200),
  // Links carry the address too; it is not needed (the token finds its account).
  email: z.string().max(254).optional(),
});
