import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { getDb } from "@/db/client";
import { saveMailMessage } from "@/db/queries/mail";
import { KIND_HEADER, startLocalSmtpServer, type LocalSmtpServer } from "./local-smtp";

export type OutgoingMail = {
  /** What the mail is for (sign-in-link, verify-email, invitation, …); shown in the mailroom. */
  kind: string;
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
};

export function mailFrom(): string {
  return process.env.MAIL_FROM || "Vierbein <no-reply@vierbein.test>";
}

/** True when mail leaves through SMTP_URL; otherwise it goes to the local SMTP server (the mailroom). */
export function usesExternalSmtp(): boolean {
  return Boolean(process.env.SMTP_URL);
}

// Kept on globalThis: server.ts (run by tsx) and Next's bundled route handlers are separate
// module graphs in one process, and must share one local SMTP server and one transport.
type MailState = { local?: Promise<LocalSmtpServer>; transport?: Transporter; transportUrl?: string };
const key = Symbol.for("vierbein.mail");
const shared = globalThis as unknown as Record<symbol, MailState | undefined>;
const state = (): MailState => (shared[key] ??= {});

/**
 * Starts the local SMTP server once per process (server.ts calls this at start-up; a test
 * or script that sends mail gets one on first use). Port 0 picks a free port.
 */
export function ensureLocalSmtpServer({ port = Number(process.env.SMTP_FAKE_PORT || 0) }: { port?: number } = {}): Promise<LocalSmtpServer> {
  const current = state();
  current.local ??= startLocalSmtpServer({ port }).catch((error: unknown) => {
    current.local = undefined; // a later send may try again
    throw error;
  });
  return current.local;
}

/** Stops the local SMTP server if this process started one. */
export async function stopLocalSmtpServer(): Promise<void> {
  const current = state();
  const local = current.local;
  current.local = undefined;
  current.transport?.close();
  current.transport = undefined;
  if (local) await (await local).close();
}

async function transport(): Promise<Transporter> {
  const current = state();
  const url = process.env.SMTP_URL || (await ensureLocalSmtpServer()).url;
  if (!current.transport || current.transportUrl !== url) {
    current.transport?.close();
    // The local server offers no TLS; a real SMTP_URL negotiates whatever it offers.
    current.transport = nodemailer.createTransport(url, { ignoreTLS: !process.env.SMTP_URL } as never);
    current.transportUrl = url;
  }
  return current.transport;
}

/** Sends one mail over SMTP. Resolves once the server (real, or the local one) has accepted it. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const to = Array.isArray(mail.to) ? mail.to : [mail.to];
  if (to.length === 0) return;
  const from = mailFrom();
  await (await transport()).sendMail({ from, to, subject: mail.subject, text: mail.text, html: mail.html, headers: { [KIND_HEADER]: mail.kind } });
  if (usesExternalSmtp() && process.env.NODE_ENV !== "production") {
    // Development against a real SMTP server: keep a copy, so the mailroom still shows what was sent.
    await saveMailMessage({ db: await getDb(), message: { kind: mail.kind, from, to, subject: mail.subject, text: mail.text, html: mail.html ?? null } });
  }
  if (process.env.NODE_ENV === "development") console.info(`[mail] ${mail.kind} to ${to.join(", ")}: ${mail.subject}`);
}
