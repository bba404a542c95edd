import { expect, type Page } from "@playwright/test";

export class SignUpPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto("/sign-up");
    await expect(this.page.getByRole("heading", { name: "Create an account", level: 1 })).toBeVisible();
  }

  async signUp({ name, email, password }: { name: string; email: string; password: string }) {
    await this.page.getByLabel("Name").fill(name);
    await this.page.getByLabel("E-mail", { exact: true }).fill(email);
    await this.page.getByLabel("Password", { exact: true }).fill(password);
    await this.page.getByLabel("Repeat the password").fill(password);
    await this.page.getByRole("button", { name: "Create the account" }).click();
  }

  confirmation() {
    return this.page.getByRole("status").filter({ hasText: "Check" });
  }
}
