import { expect, type Page } from "@playwright/test";

type MailroomMessage = { kind?: string; to: string[] | string; subject: string; text: string };

/** Whether this server exposes the mailroom's messages (development, demo and test runs only). */
export async function mailroomAvailable(page: Page): Promise<boolean> {
  const response = await page.request.get("/api/mailroom");
  return response.ok();
}

/**
 * Reads what the app "sent" from the mailroom (the local stand-in for outgoing mail) and
 * returns the first link in the newest message to `email` whose text matches `pathPattern`.
 */
export async function linkFromMailroom(page: Page, email: string, pathPattern: RegExp): Promise<string> {
  const response = await page.request.get(`/api/mailroom?to=${encodeURIComponent(email)}`);
  expect(response.ok(), `the mailroom answered ${response.status()}; e2e needs GET /api/mailroom in test runs`).toBe(true);
  const body = (await response.json()) as { messages: MailroomMessage[] } | MailroomMessage[];
  const messages = Array.isArray(body) ? body : body.messages;
  for (const message of messages) {
    const recipients = Array.isArray(message.to) ? message.to : [message.to];
    if (!recipients.some((to) => to.toLowerCase().includes(email.toLowerCase()))) continue;
    const link = message.text.match(/https?:\/\/\S+/g)?.find((url) => pathPattern.test(url));
    if (link) return link;
  }
  throw new Error(`no mail to ${email} with a link matching ${pathPattern}`);
}

/** Opens the confirmation link mailed after sign-up and waits until the page says the address is confirmed. */
export async function confirmEmailFromMailroom(page: Page, email: string): Promise<void> {
  const link = new URL(await linkFromMailroom(page, email, /\/verify-email\?/));
  await page.goto(link.pathname + link.search);
  await expect(page.getByText("Your e-mail address is confirmed.")).toBeVisible();
}
