import { expect, type Page } from "@playwright/test";

type Justification = "algebra" | "substitute" | "differentiate by" | "Euler–Lagrange in" | "limit" | "definition";

/** Writing steps in the notebook and reading their verdicts, by accessible names. */
export class NotebookSteps {
  constructor(private readonly page: Page) {}

  private insertButton(name: string) {
    return this.page.getByRole("toolbar", { name: "Insert" }).getByRole("button", { name, exact: true });
  }

  source(n: number) {
    return this.page.getByLabel(`LaTeX source of step ${n}`, { exact: true });
  }

  /** Puts the caret at the end of step n, so the next inserted block lands after it. */
  async caretAfterStep(n: number) {
    await this.source(n).click();
    await this.page.keyboard.press("End");
  }

  /** Inserts a step after the caret's block and writes its relation and justification. */
  async addStep(n: number, relation: string, justification: Justification = "algebra", detail = "") {
    await this.insertButton("Step").click();
    await expect(this.source(n)).toBeVisible();
    // insertText, not type: the relation goes in as written, with no shortcut expanding it
    await this.page.keyboard.insertText(relation);
    await expect(this.source(n)).toHaveText(relation);
    if (justification !== "algebra") await this.page.getByLabel(`Justification of step ${n}`, { exact: true }).selectOption({ label: justification });
    if (detail) await this.page.getByLabel(`Justification detail of step ${n}`, { exact: true }).fill(detail);
  }

  async insertSpacetimeBlock() {
    await this.insertButton("Spacetime block").click();
  }

  verdict(n: number) {
    return this.page.getByRole("complementary", { name: `Verdict of step ${n}`, exact: true });
  }

  async expectVerdict(n: number, word: "verified" | "refuted" | "undecided") {
    await expect(this.verdict(n).getByRole("status")).toContainText(word, { timeout: 30_000 });
  }
}
