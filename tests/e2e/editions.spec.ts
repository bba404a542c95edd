import { expect, test } from "@playwright/test";
import { EditionPage, EditionRecords } from "./pages/edition-records";
import { demoAccounts } from "./support/demo-accounts";
import { openAs } from "./support/open-notebook";

const notebook = "Test-particle orbits around Kestrel-7";

test("the group lead publishes an edition of a demo notebook; its permanent link shows the ledger to someone signed out", async ({ browser }) => {
  // Several browsers, each checking the notebook's steps in its own worker: slow on two cores.
  test.slow();
  test.setTimeout(240_000);
  const lead = await openAs(browser, demoAccounts.lead, notebook);

  const link = await new EditionRecords(lead).publish();
  expect(link).toMatch(/\/editions\/[0-9a-f-]{36}\/1$/);
  await expect(new EditionRecords(lead).section().getByRole("link", { name: "Edition 1" })).toBeVisible();

  // A fresh browser context has no session: the permanent page is public.
  const visitor = await (await browser.newContext()).newPage();
  await visitor.goto(new URL(link).pathname);
  await expect(visitor.getByRole("heading", { name: notebook, level: 1 })).toBeVisible();
  const edition = new EditionPage(visitor);
  await expect(edition.ledger()).toBeVisible();
  // The Kestrel-7 notebook has 26 steps (db/demo/notebooks/kestrel-schwarzschild-orbits.ts): one row each plus the header.
  await expect(edition.ledger().getByRole("row")).toHaveCount(27);
  await expect(edition.ledger().getByRole("cell", { name: /verified/ }).first()).toBeVisible();
  await expect(edition.citation()).toContainText("@misc{vierbein-");
});
