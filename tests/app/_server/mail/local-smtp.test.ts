// The mailroom's SMTP server: real SMTP in, parsed messages out.
import nodemailer from "nodemailer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { KIND_HEADER, startLocalSmtpServer, type LocalSmtpServer } from "@/app/_server/mail/local-smtp";

type Stored = { kind: string; from: string; to: string[]; subject: string; text: string; html: string | null };

describe("the local SMTP server", () => {
  const received: Stored[] = [];
  let server: LocalSmtpServer;

  beforeAll(async () => {
    server = await startLocalSmtpServer({ port: 0, store: async (message) => void received.push(message) });
  });
  afterAll(() => server.close());

  it("listens on the loopback interface", () => {
    expect(server.url).toBe(`smtp://127.0.0.1:${server.port}`);
    expect(server.port).toBeGreaterThan(0);
  });

  it("stores what nodemailer sends over SMTP, with every envelope recipient (Bcc too) and the kind header", async () => {
    const transport = nodemailer.createTransport(server.url, { ignoreTLS: true } as never);
    const info = await transport.sendMail({
      from: "Vierbein <no-reply@vierbein.test>",
      to: "Author@Example.test",
      cc: "lead@example.test",
      bcc: "hidden@example.test",
      subject: "Remark on step 17",
      text: "The sign of the last term looks wrong.",
      html: "<p>The sign of the last term looks wrong.</p>",
      headers: { [KIND_HEADER]: "remark" },
    });
    transport.close();
    expect(info.accepted).toHaveLength(3);
    expect(received).toHaveLength(1);
    expect(received[0]).toMatchObject({
      kind: "remark",
      from: "Vierbein <no-reply@vierbein.test>",
      subject: "Remark on step 17",
      text: "The sign of the last term looks wrong.",
      html: "<p>The sign of the last term looks wrong.</p>",
    });
    expect(received[0].to.sort()).toEqual(["author@example.test", "hidden@example.test", "lead@example.test"]);
  });

  it("refuses the message (and the sender learns it) when it cannot be stored", async () => {
    const failing = await startLocalSmtpServer({ store: async () => Promise.reject(new Error("disk full")) });
    const transport = nodemailer.createTransport(failing.url, { ignoreTLS: true } as never);
    const quiet = console.error;
    console.error = () => {};
    try {
      await expect(transport.sendMail({ from: "a@example.test", to: "b@example.test", subject: "x", text: "x" })).rejects.toThrow(/could not store/);
    } finally {
      console.error = quiet;
      transport.close();
      await failing.close();
    }
  });
});
