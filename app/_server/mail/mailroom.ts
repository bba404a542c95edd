import "server-only";

/**
 * Whether the mailroom (the page and GET /api/mailroom) exists: in development, tests and
 * demo runs. A production server with a real SMTP_URL has none, since it would show other
 * people's mail.
 */
export function mailroomEnabled(): boolean {
  return !(process.env.NODE_ENV === "production" && process.env.SMTP_URL);
}
