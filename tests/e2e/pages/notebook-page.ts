import { expect, type Page } from "@playwright/test";

export class NotebookPage {
  constructor(private readonly page: Page) {}

  async expectTitle(title: string) {
    await expect(this.page).toHaveURL(/\/notebooks\/[0-9a-f-]{36}$/);
    await expect(this.page.getByRole("heading", { name: title, level: 1 })).toBeVisible();
  }

  readOnlyBadge() {
    return this.page.getByText("Read-only", { exact: true });
  }
}
