import "server-only";
import type { Db } from "@/db/client";
import { listGroupMemberAddresses } from "@/db/queries/mail";
import { getGroupById } from "@/db/queries/groups";
import { getNotebookById } from "@/db/queries/notebooks";
import type { Role } from "../authz";
import { appBaseUrl } from "../secret";
import { sendMail } from "./send";

// The mails the app sends about group work. Each says who caused it and links back; the
// person who caused it is never among the recipients.

// The glossary's names of the roles, as a mail says them.
const roleNames: Record<Role, string> = { lead: "group lead", author: "author", reviewer: "reviewer", reader: "reader" };

const dateFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "long", timeZone: "UTC" });

function quote(text: string, max = 600): string {
  const trimmed = text.length > max ? `${text.slice(0, max)}…` : text;
  return trimmed
    .split("\n")
    .map((line) => `> ${line}`)
    .join("\n");
}

export async function sendInvitationMail({
  to,
  groupName,
  role,
  inviterName,
  token,
  expiresAt,
}: {
  to: string;
  groupName: string;
  role: Role;
  inviterName: string;
  token: string;
  expiresAt: Date;
}): Promise<void> {
  await sendMail({
    kind: "invitation",
    to,
    subject: `${inviterName} invites you to ${groupName} on Vierbein`,
    text: `${inviterName} invites you to join the research group "${groupName}" on Vierbein as ${roleNames[role]}.\n\nOpen this link to accept; it signs you in, or lets you make an account for this address:\n\n${appBaseUrl()}/invitations/${token}\n\nThe link works once, until ${dateFormat.format(expiresAt)} (UTC). If you do not know ${inviterName}, ignore this mail.`,
  });
}

export async function sendReviewRequestMail({
  to,
  notebookId,
  notebookTitle,
  requesterName,
  message,
}: {
  to: string;
  notebookId: string;
  notebookTitle: string;
  requesterName: string;
  message: string;
}): Promise<void> {
  await sendMail({
    kind: "review-request",
    to,
    subject: `Review requested: ${notebookTitle}`,
    text: `${requesterName} asks you to review the notebook "${notebookTitle}".${message ? `\n\n${quote(message)}` : ""}\n\nOpen it here, select a span or use a step's remark button to leave remarks:\n\n${appBaseUrl()}/notebooks/${notebookId}`,
  });
}

/** A new remark thread or a reply: to the notebook's authors and leads and the thread's participants, minus the writer. */
export async function sendRemarkMail({
  to,
  notebookId,
  notebookTitle,
  writerName,
  body,
  isReply,
  where,
}: {
  to: string[];
  notebookId: string;
  notebookTitle: string;
  writerName: string;
  body: string;
  isReply: boolean;
  /** e.g. "step 17" or "“the quoted span”". */
  where: string;
}): Promise<void> {
  await sendMail({
    kind: isReply ? "remark-reply" : "remark",
    to,
    subject: isReply ? `${writerName} replied to a remark on ${notebookTitle}` : `New remark on ${notebookTitle}${where ? ` (${where})` : ""}`,
    text: `${writerName} ${isReply ? "replied to a remark" : "left a remark"} on "${notebookTitle}"${where ? ` at ${where}` : ""}:\n\n${quote(body)}\n\nRead the thread and answer it here:\n\n${appBaseUrl()}/notebooks/${notebookId}#remarks`,
  });
}

/**
 * Tells every member of the notebook's group, except the one who published, that an
 * edition is out, with its permanent link. For the editions route to call after the row
 * is stored; a failure to mail is for the caller to log, not to undo the publication.
 *
 * @example await sendEditionPublishedMail({ db, notebookId, number: 2, publishedBy: user.id })
 */
export async function sendEditionPublishedMail({
  db,
  notebookId,
  number,
  publishedBy,
  permalink = `/editions/${notebookId}/${number}`,
}: {
  db: Db;
  notebookId: string;
  number: number;
  publishedBy: string | null;
  /** Path or absolute URL of the edition's permanent page. */
  permalink?: string;
}): Promise<void> {
  const notebook = await getNotebookById({ db, id: notebookId });
  if (!notebook) return;
  const group = await getGroupById({ db, id: notebook.groupId });
  const to = await listGroupMemberAddresses({ db, groupId: notebook.groupId, exceptUserId: publishedBy });
  const link = permalink.startsWith("http") ? permalink : `${appBaseUrl()}${permalink}`;
  await sendMail({
    kind: "edition-published",
    to,
    subject: `Edition ${number} of ${notebook.title} is published`,
    text: `${group?.name ?? "Your group"} published edition ${number} of "${notebook.title}". It is frozen: its text and check ledger will not change.\n\nPermanent link:\n\n${link}`,
  });
}
