import "server-only";
import type { JSONContent } from "@tiptap/core";
import JSZip from "jszip";
import type { Db } from "@/db/client";
import { getAttachmentsOfNotebook } from "@/db/queries/attachments";
import { exportLatex } from "@/editor/export-latex";
import type { LedgerEntry } from "../editions/ledger";
import { getObject } from "../storage/object-store";
import { EXTENSION_BY_TYPE, FIGURE_TYPES, type AttachmentType } from "../storage/sniff";

export interface TexDownload {
  readonly fileName: string;
  readonly contentType: string;
  readonly body: Uint8Array;
}

/** A file name from a title: lower-case ASCII words joined by hyphens. */
export function slugOf(title: string): string {
  const slug = title
    .normalize("NFKD")
    .replace(/[^\x20-\x7e]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);
  return slug || "notebook";
}

/** The verdict words printed beside each step of an edition. */
function ledgerVerdicts(ledger: readonly LedgerEntry[]): Map<string, string> {
  return new Map(
    ledger.map((entry) => {
      const how = entry.method.kind === "numeric" ? `numerically at ${entry.method.points} points, probabilistic` : entry.method.kind === "symbolic" ? "symbolically" : "";
      return [entry.id, how ? `${entry.verdict} (${how})` : entry.verdict];
    }),
  );
}

/**
 * Builds the download of a notebook (or one of its editions) as LaTeX: a .tex file, or a
 * zip of the .tex and a figures/ folder when the document places figure attachments.
 */
export async function buildTexDownload({
  db,
  notebookId,
  title,
  author,
  content,
  edition,
}: {
  db: Db;
  notebookId: string;
  title: string;
  author: string;
  content: JSONContent;
  edition?: { number: number; sha256: string; publishedAt: Date; ledger: readonly LedgerEntry[] };
}): Promise<TexDownload> {
  const options = {
    title,
    author,
    date: edition ? `Edition ${edition.number}, published ${edition.publishedAt.toISOString().slice(0, 10)}` : `Working copy, exported ${new Date().toISOString().slice(0, 10)}`,
    note: edition ? `SHA-256 ${edition.sha256}` : undefined,
    verdicts: edition ? ledgerVerdicts(edition.ledger) : undefined,
  };
  const placed = exportLatex(content, options).figureIds;
  const attachments = (await getAttachmentsOfNotebook({ db, notebookId, ids: placed })).filter((a) => FIGURE_TYPES.includes(a.contentType as AttachmentType));
  const stem = slugOf(title) + (edition ? `-edition-${edition.number}` : "");
  const files = new Map<string, Uint8Array>();
  for (const attachment of attachments) {
    const bytes = await getObject({ key: attachment.storageKey });
    if (bytes) files.set(attachment.id, bytes);
  }
  const paths = new Map([...files.keys()].map((id) => [id, `figures/${id}.${EXTENSION_BY_TYPE[attachments.find((a) => a.id === id)!.contentType as AttachmentType]}`]));
  const { tex } = exportLatex(content, { ...options, figures: paths });
  if (files.size === 0) {
    return { fileName: `${stem}.tex`, contentType: "application/x-tex; charset=utf-8", body: new TextEncoder().encode(tex) };
  }
  const zip = new JSZip();
  const folder = zip.folder(stem)!;
  folder.file(`${stem}.tex`, tex);
  for (const [id, bytes] of files) folder.file(paths.get(id)!, bytes);
  return { fileName: `${stem}.zip`, contentType: "application/zip", body: await zip.generateAsync({ type: "uint8array", compression: "DEFLATE" }) };
}
