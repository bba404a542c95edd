import { expect, type Page } from "@playwright/test";

export class GroupSettingsPage {
  constructor(private readonly page: Page) {}

  async openFromDashboard(groupName: string) {
    await this.page.goto("/dashboard");
    await this.page.getByRole("region", { name: "Your groups" }).getByRole("link", { name: groupName }).click();
    await expect(this.page.getByRole("heading", { name: groupName, level: 1 })).toBeVisible();
  }

  members() {
    return this.page.getByRole("table", { name: "Members of the group and their roles" });
  }

  async addMember(email: string, roleLabel: string) {
    const form = this.page.getByRole("form", { name: "Add a member" });
    await form.getByLabel("Member's e-mail").fill(email);
    await form.getByLabel("Role").selectOption({ label: roleLabel });
    await form.getByRole("button", { name: "Add" }).click();
  }

  roleOf(name: string) {
    return this.members().getByLabel(`Role of ${name}`);
  }

  async remove(name: string) {
    this.page.once("dialog", (dialog) => void dialog.accept());
    await this.members().getByRole("button", { name: `Remove ${name}` }).click();
  }
}
