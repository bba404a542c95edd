import { expect, test } from "@playwright/test";
import { DashboardPage } from "./pages/dashboard-page";
import { NotebookPage } from "./pages/notebook-page";
import { SignInPage } from "./pages/sign-in-page";
import { demoAccounts, demoPassword } from "./support/demo-accounts";

async function signInAs(page: import("@playwright/test").Page, email: string) {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, demoPassword);
  await new DashboardPage(page).expectLoaded();
}

test("an author creates a notebook and finds it in the table", async ({ page }) => {
  await signInAs(page, demoAccounts.author);
  const dashboard = new DashboardPage(page);
  const title = `Test-particle orbits ${Date.now().toString(36)}`;
  await dashboard.createNotebook(title);
  await new NotebookPage(page).expectTitle(title);

  await dashboard.open();
  await dashboard.filter(title);
  const table = dashboard.notebooksTable();
  await expect(table.getByRole("link", { name: title })).toBeVisible();
  await expect(table.getByRole("row")).toHaveCount(2); // header + the one match
});

test("a member starts a second group, becomes its lead and creates a notebook there", async ({ page }) => {
  await signInAs(page, demoAccounts.coauthor);
  const dashboard = new DashboardPage(page);
  const groupName = `Photon-sphere side project ${Date.now().toString(36)}`;
  await dashboard.startGroup(groupName);
  await expect(dashboard.groupsPanel()).toContainText("group lead");
  await dashboard.createNotebook("Deflection angle, weak field", groupName);
  await new NotebookPage(page).expectTitle("Deflection angle, weak field");
  await expect(page.getByRole("navigation", { name: "Breadcrumb" }).getByRole("link", { name: groupName })).toBeVisible();
});

test("the notebooks table sorts by title on request, both ways", async ({ page }) => {
  await signInAs(page, demoAccounts.lead);
  const table = new DashboardPage(page).notebooksTable();
  await expect(table.getByRole("row").nth(1)).toBeVisible();
  const titles = () => table.getByRole("row").locator("td:first-child").allInnerTexts();
  const byTitle = (a: string, b: string) => a.localeCompare(b, "en", { sensitivity: "base" });

  const titleHeader = table.getByRole("columnheader", { name: /^Title/ });
  await table.getByRole("button", { name: /^Title/ }).click();
  await expect(titleHeader).toHaveAttribute("aria-sort", "ascending");
  // The previous page stays on screen until the server's sorted page arrives, so poll.
  await expect.poll(async () => {
    const shown = await titles();
    return shown.length > 1 && shown.join("|") === [...shown].sort(byTitle).join("|");
  }).toBe(true);

  await table.getByRole("button", { name: /^Title/ }).click();
  await expect(titleHeader).toHaveAttribute("aria-sort", "descending");
  await expect.poll(async () => {
    const shown = await titles();
    return shown.length > 1 && shown.join("|") === [...shown].sort(byTitle).reverse().join("|");
  }).toBe(true);
});

test("the notebooks table filters and pages through the server's results", async ({ page }) => {
  await signInAs(page, demoAccounts.author);
  // Eleven notebooks that share a unique word: one more than the first page holds.
  const tag = `paging${Date.now().toString(36)}`;
  const groups = (await (await page.request.get("/api/groups")).json()) as { groups: { id: string; role: string }[] };
  const groupId = groups.groups.find((group) => group.role === "author")!.id;
  for (let index = 1; index <= 11; index += 1) {
    const response = await page.request.post("/api/notebooks", { data: { groupId, title: `${tag} note ${String(index).padStart(2, "0")}` } });
    expect(response.status()).toBe(201);
  }

  const dashboard = new DashboardPage(page);
  await dashboard.open();
  await dashboard.filter(tag);
  const table = dashboard.notebooksTable();
  await expect(page.getByText("Page 1 of 2")).toBeVisible();
  await expect(table.getByRole("row")).toHaveCount(11); // header + 10
  await page.getByRole("button", { name: "Next page" }).click();
  await expect(page.getByText("Page 2 of 2")).toBeVisible();
  await expect(table.getByRole("row")).toHaveCount(2); // header + the eleventh
  await expect(page.getByRole("button", { name: "Next page" })).toBeDisabled();
});

test("a reader sees no way to create a notebook and the API refuses one", async ({ page }) => {
  await signInAs(page, demoAccounts.reader);
  const dashboard = new DashboardPage(page);
  await expect(dashboard.groupsPanel().getByRole("link").first()).toBeVisible();
  await expect(dashboard.newNotebookButton).toHaveCount(0);

  // The browser's session cookie rides along with page.request.
  const groups = (await (await page.request.get("/api/groups")).json()) as { groups: { id: string; role: string }[] };
  const readerGroup = groups.groups.find((group) => group.role === "reader");
  expect(readerGroup).toBeDefined();
  const response = await page.request.post("/api/notebooks", { data: { groupId: readerGroup!.id, title: "Not allowed" } });
  expect(response.status()).toBe(403);
});

test("a reader opens a demo notebook read-only", async ({ page }) => {
  await signInAs(page, demoAccounts.reader);
  const table = new DashboardPage(page).notebooksTable();
  const firstLink = table.getByRole("link").first();
  const title = (await firstLink.innerText()).trim();
  await firstLink.click();
  const notebook = new NotebookPage(page);
  await notebook.expectTitle(title);
  await expect(notebook.readOnlyBadge()).toBeVisible();
  await expect(page.getByRole("button", { name: "Rename the notebook" })).toHaveCount(0);
});
