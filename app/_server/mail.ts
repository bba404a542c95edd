import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { getDb } from "@/db/client";
import { saveMailMessage } from "@/db/queries/mail";

export type OutgoingMail = {
  /** What the mail is for (sign-in-link, verify-email, reset-password, …); shown in the mailroom. */
  kind: string;
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
};

export function mailFrom(): string {
  return process.env.MAIL_FROM || "Vierbein <no-reply@vierbein.test>";
}

// One transport per process: SMTP when SMTP_URL is set, otherwise nodemailer's JSON
// transport, which sends nothing; then the message is kept in mail_messages for the mailroom.
const key = Symbol.for("vierbein.mail-transport");
const store = globalThis as unknown as Record<symbol, Transporter | undefined>;

function transport(): Transporter {
  return (store[key] ??= process.env.SMTP_URL
    ? nodemailer.createTransport(process.env.SMTP_URL)
    : nodemailer.createTransport({ jsonTransport: true }));
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  const to = Array.isArray(mail.to) ? mail.to : [mail.to];
  const from = mailFrom();
  await transport().sendMail({ from, to, subject: mail.subject, text: mail.text, html: mail.html });
  if (!process.env.SMTP_URL) {
    const db = await getDb();
    await saveMailMessage({ db, message: { kind: mail.kind, from, to, subject: mail.subject, text: mail.text, html: mail.html ?? null } });
    if (process.env.NODE_ENV !== "test") console.info(`[mail] ${mail.kind} to ${to.join(", ")}: ${mail.subject}`);
  }
}
