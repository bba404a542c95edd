import { expect, type Page } from "@playwright/test";

/** The notebook's text and its co-editing signals, found by their accessible names. */
export class SharedEditor {
  constructor(private readonly page: Page) {}

  text() {
    return this.page.getByLabel(/^Notebook text/);
  }

  async waitUntilOpen() {
    await expect(this.text()).toBeVisible({ timeout: 30_000 });
  }

  /** Puts the caret at the end of the first paragraph and types there. */
  async typeAtEndOfFirstParagraph(words: string) {
    const paragraph = this.text().locator("p").first();
    await paragraph.click();
    await this.page.keyboard.press("End");
    await this.page.keyboard.type(words);
  }

  storedState() {
    return this.page.getByRole("status").filter({ hasText: /stored on the server|Storing|Offline|Connecting/ });
  }

  alsoHere() {
    return this.page.getByRole("list", { name: "Also here" });
  }

  /** A co-author's caret tab, labelled with their name. */
  caretOf(name: string) {
    return this.text().getByText(name, { exact: true });
  }
}
