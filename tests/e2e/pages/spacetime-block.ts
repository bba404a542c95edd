import { expect, type Locator, type Page } from "@playwright/test";

/** A spacetime block in the notebook, and the curvature sheet and orbit panel it opens. */
export class SpacetimeBlockPanel {
  readonly region: Locator;

  constructor(private readonly page: Page, name?: string | RegExp) {
    this.region = page.getByRole("region", { name: name ?? /^Spacetime block/ }).first();
  }

  async openCurvatureSheet(): Promise<CurvatureSheetDialog> {
    await this.region.getByRole("button", { name: "Curvature sheet" }).click();
    const sheet = new CurvatureSheetDialog(this.page);
    await expect(sheet.dialog).toBeVisible();
    return sheet;
  }

  async openOrbitPanel(): Promise<OrbitPanelDialog> {
    await this.region.getByRole("button", { name: "Orbit panel" }).click();
    const panel = new OrbitPanelDialog(this.page);
    await expect(panel.dialog).toBeVisible();
    return panel;
  }

  /** Types a line element into the block's declarations and saves them. */
  async setLineElement(latex: string) {
    await this.region.getByRole("button", { name: "Edit declarations" }).click();
    const form = this.region.getByRole("form", { name: "Edit spacetime block" });
    await form.getByLabel("Line element (LaTeX)").fill(latex);
    await form.getByRole("button", { name: "Save block" }).click();
  }
}

export class CurvatureSheetDialog {
  readonly dialog: Locator;

  constructor(page: Page) {
    this.dialog = page.getByRole("dialog", { name: /^Curvature sheet/ });
  }

  section(name: "Christoffel symbols" | "Riemann tensor" | "Ricci tensor" | "Ricci scalar" | "Einstein tensor" | "Kretschmann scalar") {
    return this.dialog.getByRole("region", { name });
  }

  conventions() {
    return this.dialog.getByRole("complementary", { name: "Conventions and checks" });
  }

  async close() {
    await this.dialog.getByRole("button", { name: "Close" }).click();
    await expect(this.dialog).toBeHidden();
  }
}

export class OrbitPanelDialog {
  readonly dialog: Locator;

  constructor(page: Page) {
    this.dialog = page.getByRole("dialog", { name: /^Orbit panel/ });
  }

  numbers() {
    return this.dialog.getByRole("region", { name: "Orbit numbers" });
  }

  /** The value cell of one row of the numbers table. */
  number(quantity: string) {
    return this.numbers().getByRole("row", { name: new RegExp(`^${quantity}\\b`) }).getByRole("cell").first();
  }

  potentialPlot() {
    return this.dialog.getByRole("figure", { name: "Effective potential plot" });
  }

  orbitPlot() {
    return this.dialog.getByRole("figure", { name: "Orbit plot" });
  }

  slider(label: string | RegExp) {
    return this.dialog.getByRole("slider", { name: label });
  }
}
