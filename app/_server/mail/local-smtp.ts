import "server-only";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import { getDb } from "@/db/client";
import { saveMailMessage } from "@/db/queries/mail";
import type { MailMessage } from "@/db/schema";

/**
 * The mailroom's SMTP server: the local stand-in for an outgoing-mail service. Without
 * SMTP_URL the app sends real SMTP to this server in its own process; each received
 * message is parsed and kept in mail_messages, which the mailroom page shows.
 */
export interface LocalSmtpServer {
  readonly port: number;
  /** What nodemailer connects to, e.g. smtp://127.0.0.1:2525. */
  readonly url: string;
  close(): Promise<void>;
}

/** Header our sender sets so the mailroom can say what a message was for. */
export const KIND_HEADER = "x-vierbein-kind";

const LOOPBACK = "127.0.0.1";
const MAX_MESSAGE_BYTES = 2 * 1024 * 1024;

type Store = (message: Omit<MailMessage, "id" | "createdAt">) => Promise<void>;

const storeInDatabase: Store = async (message) => {
  await saveMailMessage({ db: await getDb(), message });
};

/**
 * Starts the server on the loopback interface. Port 0 takes any free port. The listening
 * socket is unref'd: a test process or a one-off script may exit while it runs.
 */
export async function startLocalSmtpServer({ port = 0, store = storeInDatabase }: { port?: number; store?: Store } = {}): Promise<LocalSmtpServer> {
  const server = new SMTPServer({
    // Loopback only, no secrets to protect: no TLS, no sign-in.
    disabledCommands: ["STARTTLS", "AUTH"],
    authOptional: true,
    size: MAX_MESSAGE_BYTES,
    logger: false,
    banner: "Vierbein mailroom",
    onData(stream, session, callback) {
      // The envelope, not the To header, says who receives a message (Bcc included).
      const recipients = session.envelope.rcptTo.map((rcpt) => rcpt.address.toLowerCase());
      const sender = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
      simpleParser(stream)
        .then(async (parsed) => {
          const kind = parsed.headers.get(KIND_HEADER);
          // Answer 250 only once the message is stored, so a sender that was told "sent" finds it in the mailroom.
          await store({
            kind: typeof kind === "string" && kind ? kind : "other",
            from: parsed.from?.value.map((a) => (a.name ? `${a.name} <${a.address}>` : a.address)).join(", ") || sender,
            to: recipients,
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : null,
          });
          callback();
        })
        .catch((error: unknown) => {
          console.error("[mailroom] could not store a message", error);
          callback(new Error("The mailroom could not store this message."));
        });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.server.once("error", reject);
    server.listen(port, LOOPBACK, () => {
      server.server.off("error", reject);
      resolve();
    });
  });
  server.server.unref();
  const address = server.server.address();
  const bound = typeof address === "object" && address ? address.port : port;
  return {
    port: bound,
    url: `smtp://${LOOPBACK}:${bound}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
