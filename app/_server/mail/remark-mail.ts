import "server-only";
import type { Db } from "@/db/client";
import { listGroupMemberAddresses } from "@/db/queries/mail";
import { listRemarkThreadWriters, type RemarkAnchor } from "@/db/queries/remarks";
import type { Notebook } from "@/db/schema";
import { sendRemarkMail } from "./notifications";

type DocNode = { type?: string; attrs?: Record<string, unknown>; content?: DocNode[] };

/** A step's number (its place among the notebook's steps, from 1), or null when no step has that id. */
export function stepNumberOf(document: Record<string, unknown>, stepId: string): number | null {
  let count = 0;
  const visit = (node: DocNode): number | null => {
    if (node.type === "step") {
      count += 1;
      if (node.attrs?.id === stepId) return count;
    }
    for (const child of node.content ?? []) {
      const found = visit(child);
      if (found !== null) return found;
    }
    return null;
  };
  return visit(document as DocNode);
}

/** "step 17", "“the quoted span”", or both, for a mail's subject line. */
export function describeAnchor(anchor: RemarkAnchor, stepNumber: number | null): string {
  const quote = anchor.quote ? `“${anchor.quote.length > 60 ? `${anchor.quote.slice(0, 60)}…` : anchor.quote}”` : "";
  const step = stepNumber ? `step ${stepNumber}` : "";
  return [step, quote].filter(Boolean).join(", ");
}

/**
 * Mails a new remark or reply to the notebook's authors and leads and, for a reply, to
 * everyone who wrote in the thread; never to the writer. Mail trouble is logged, not
 * thrown: the remark is already stored.
 */
export async function notifyRemark({
  db,
  notebook,
  threadId,
  writer,
  body,
  isReply,
  where,
}: {
  db: Db;
  notebook: Notebook;
  threadId: string;
  writer: { id: string; name: string; email: string };
  body: string;
  isReply: boolean;
  where: string;
}): Promise<string[]> {
  const members = await listGroupMemberAddresses({ db, groupId: notebook.groupId, roles: ["lead", "author"], exceptUserId: writer.id });
  const thread = isReply ? await listRemarkThreadWriters({ db, threadId }) : [];
  const to = [...new Set([...members, ...thread.filter((p) => p.id !== writer.id).map((p) => p.email)])];
  try {
    await sendRemarkMail({ to, notebookId: notebook.id, notebookTitle: notebook.title, writerName: writer.name || writer.email, body, isReply, where });
  } catch (error) {
    console.error("[mail] remark notification failed", error);
  }
  return to;
}
