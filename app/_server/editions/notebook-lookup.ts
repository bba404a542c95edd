import "server-only";
import type { Db } from "@/db/client";
import { getNotebookById } from "@/db/queries/notebooks";
import type { Notebook } from "@/db/schema";
import type { ResourceFor } from "../authz";
import { AppError } from "../errors";

/**
 * The notebook, or 404 not_found:notebook; with the resource `authorize` asks about.
 * Behind `admitToNotebook` (guard.ts), and used as it is by the public edition, export and attachment reads.
 */
export async function findNotebook(db: Db, id: string): Promise<{ notebook: Notebook; resource: ResourceFor<"notebook:read"> }> {
  const notebook = await getNotebookById({ db, id });
  if (!notebook) throw new AppError("not_found:notebook", "No notebook with that id.");
  return { notebook, resource: { type: "notebook", groupId: notebook.groupId, notebookId: notebook.id } };
}
