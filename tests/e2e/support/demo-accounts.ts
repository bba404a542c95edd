// The demo loader's accounts (db/demo); the password is demo-only and stated in the README.
export const demoPassword = "relativity";
export const demoAccounts = {
  lead: "lead@vierbein.test",
  author: "author@vierbein.test",
  coauthor: "coauthor@vierbein.test",
  reviewer: "reviewer@vierbein.test",
  reader: "reader@vierbein.test",
} as const;

/** A fresh address per run, so sign-up never collides with an earlier test's account. */
export function uniqueEmail(prefix: string): string {
  return `${prefix}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 7)}@example.test`;
}
