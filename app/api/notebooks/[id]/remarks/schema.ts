import { z } from "zod";
import { idSchema } from "@/app/_server/parse";

export const remarkBodyField = z.string("body: the remark's text.").trim().min(1, "Write the remark first.").max(4000, "A remark holds at most 4000 characters.");

// Yjs relative positions, base64-encoded by the client; short, and never interpreted as text.
const relativePosition = z.base64("span: positions are base64.").max(512);

export const remarkAnchor = z
  .strictObject({
    stepId: z.string().regex(/^[A-Za-z0-9_-]{1,64}$/, "stepId: not a step id.").optional(),
    span: z.strictObject({ from: relativePosition, to: relativePosition }).optional(),
    quote: z.string().max(500, "quote: at most 500 characters.").optional(),
  })
  .refine((anchor) => anchor.stepId || anchor.span, "anchor: name a step (stepId) or a span (span), or both.");

export const createRemarkBody = z.strictObject({ body: remarkBodyField, anchor: remarkAnchor });

export const remarksQuery = z.object({
  status: z.enum(["open", "settled", "all"], "status: open, settled or all.").default("all"),
  author: idSchema.optional(),
});

export const notebookRemarksParams = z.object({ id: idSchema });
