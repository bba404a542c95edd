import "server-only";
import type { JSONContent } from "@tiptap/core";
import type { Db } from "@/db/client";
import { createEdition } from "@/db/queries/editions";
import type { Edition, Notebook } from "@/db/schema";
import { readNotebookDocument } from "../collab/documents";
import { AppError } from "../errors";
import { editionSha256 } from "./canonical";
import { buildLedger, poolCheck, type LedgerEntry, type RunCheck } from "./ledger";

export type PublishOutcome =
  | { readonly published: Edition; readonly ledger: LedgerEntry[] }
  | { readonly refused: "refuted"; readonly refuted: LedgerEntry[]; readonly ledger: LedgerEntry[] };

/**
 * Publishes the notebook's current document as its next edition: reads it from the live
 * document, re-runs every check, and refuses while a step is refuted unless the lead gave a
 * reason. The stored row is frozen by the database (see the edition_immutable migration).
 */
export async function publishEdition({
  db,
  notebook,
  publishedBy,
  reason,
  run = poolCheck,
}: {
  db: Db;
  notebook: Notebook;
  publishedBy: string;
  reason: string | null;
  run?: RunCheck;
}): Promise<PublishOutcome> {
  const document = await readNotebookDocument({ db, notebookId: notebook.id });
  if (!document) throw new AppError("not_found:notebook", "No notebook with that id.");
  const content = document.json;
  const ledger = await buildLedger({ content: content as JSONContent, run });
  const refuted = ledger.filter((entry) => entry.verdict === "refuted");
  if (refuted.length > 0 && !reason) return { refused: "refuted", refuted, ledger };
  const published = await createEdition({
    db,
    notebookId: notebook.id,
    title: notebook.title,
    content,
    ledger: ledger as unknown[],
    // A reason is kept only when something was refuted: that is what it answers for.
    reason: refuted.length > 0 ? reason : null,
    publishedBy,
    hashFor: (number) => editionSha256({ notebookId: notebook.id, number, title: notebook.title, content, ledger, reason: refuted.length > 0 ? reason : null }),
  });
  return { published, ledger };
}
