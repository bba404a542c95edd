// The shapes of the invented demo data. All names, objects and numbers here are made up.
import type { Role } from "../queries/roles";

export type DemoAccount = { email: string; name: string; role: Role };

export type DemoNotebook = {
  /** Fixed, so loading twice updates the same row instead of adding another. */
  id: string;
  title: string;
  summary: string;
  /** Who appears as its creator (one of the demo accounts). */
  createdBy: string;
  /** Tiptap JSON of the document, or null while the editor work has not written it. */
  content: Record<string, unknown> | null;
};
