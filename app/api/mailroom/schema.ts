import { z } from "zod";

export const mailroomQuery = z.object({
  to: z.string().trim().max(254).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
