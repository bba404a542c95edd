import { expect, type Page } from "@playwright/test";

/** The notebook's editions section and an edition's permanent page, found by roles and labels. */
export class EditionRecords {
  constructor(private readonly page: Page) {}

  section() {
    return this.page.getByRole("region", { name: "Editions" });
  }

  /** Publishes as the lead; returns the permanent link the server answers with. */
  async publish(reason?: string): Promise<string> {
    await this.section().getByRole("button", { name: "Publish an edition…" }).click();
    const form = this.page.getByRole("form", { name: "Publish an edition" });
    if (reason) await form.getByLabel(/Reason for publishing/).fill(reason);
    await form.getByRole("button", { name: "Publish edition" }).click();
    const done = this.section().getByRole("status").filter({ hasText: /is published and frozen/ });
    await expect(done).toBeVisible({ timeout: 120_000 });
    return (await done.getByRole("link").getAttribute("href"))!;
  }
}

export class EditionPage {
  constructor(private readonly page: Page) {}

  ledger() {
    return this.page.getByRole("table", { name: "Check ledger" });
  }

  citation() {
    return this.page.getByLabel("BibTeX entry");
  }
}
