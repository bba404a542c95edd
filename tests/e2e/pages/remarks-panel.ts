import { expect, type Page } from "@playwright/test";

/** The notebook's remarks: the step margin's remark button and the side list, by accessible names. */
export class RemarksPanel {
  constructor(private readonly page: Page) {}

  region() {
    return this.page.getByRole("region", { name: "Remarks" });
  }

  threads() {
    return this.region().getByRole("table", { name: "Remark threads on this notebook" });
  }

  async remarkOnStep(stepNumber: number, text: string) {
    await this.page.getByRole("button", { name: new RegExp(`^Remark on step ${stepNumber}(,|$)`) }).click();
    const form = this.region().getByRole("form", { name: "New remark" });
    await expect(this.region().getByText(`New remark on step ${stepNumber}`)).toBeVisible();
    await form.getByLabel("Remark").fill(text);
    await form.getByRole("button", { name: "Post the remark" }).click();
  }

  async show(status: "open remarks" | "settled remarks" | "all remarks") {
    await this.region().getByLabel("Show").selectOption({ label: status });
  }

  async openThread(text: string) {
    await this.threads().getByRole("button", { name: new RegExp(text) }).click();
    return this.region().getByRole("article", { name: /^Remark thread on/ });
  }
}
