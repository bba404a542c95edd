import { expect, type Page } from "@playwright/test";

export class DashboardPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto("/dashboard");
    await this.expectLoaded();
  }

  async expectLoaded() {
    await expect(this.page.getByRole("heading", { name: "Dashboard", level: 1 })).toBeVisible();
  }

  get newNotebookButton() {
    return this.page.getByRole("button", { name: "New notebook" });
  }

  notebooksTable() {
    return this.page.getByRole("table", { name: /Notebooks you can open/ });
  }

  groupsPanel() {
    return this.page.getByRole("region", { name: "Your groups" });
  }

  async startGroup(name: string) {
    const form = this.page.getByRole("form", { name: "Start a group" });
    await form.getByLabel("Group name").fill(name);
    await form.getByRole("button", { name: "Start the group" }).click();
    await expect(this.groupsPanel().getByRole("link", { name })).toBeVisible();
  }

  async createNotebook(title: string, groupName?: string) {
    await this.newNotebookButton.click();
    const form = this.page.getByRole("form", { name: "New notebook" });
    await form.getByLabel("Notebook title").fill(title);
    if (groupName) await form.getByLabel("Group").selectOption({ label: groupName });
    await form.getByRole("button", { name: "Create the notebook" }).click();
  }

  /** Finds a notebook by its title through the table's filter (other tests' notebooks may page it out) and opens it. */
  async openNotebook(title: string) {
    await this.filter(title);
    await this.notebooksTable().getByRole("link", { name: title }).first().click();
  }

  async filter(text: string) {
    await this.page.getByLabel("Filter notebooks by title").fill(text);
  }
}
