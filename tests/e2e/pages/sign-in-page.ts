import { expect, type Page } from "@playwright/test";

/** The sign-in page, driven by labels and roles as a person would use it. */
export class SignInPage {
  constructor(private readonly page: Page) {}

  async open(callbackUrl?: string) {
    await this.page.goto(callbackUrl ? `/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}` : "/sign-in");
    await expect(this.page.getByRole("heading", { name: "Sign in", level: 1 })).toBeVisible();
  }

  get submit() {
    return this.page.getByRole("button", { name: "Sign in", exact: true });
  }

  async signIn(email: string, password: string) {
    await this.page.getByLabel("E-mail", { exact: true }).fill(email);
    await this.page.getByLabel("Password", { exact: true }).fill(password);
    // The button stays disabled until next-auth's CSRF token has loaded.
    await expect(this.submit).toBeEnabled();
    await this.submit.click();
  }

  /** Our problem notice; Next's own route announcer also has the alert role, so match by its word. */
  problem() {
    return this.page.getByRole("alert").filter({ hasText: "Problem:" });
  }
}
