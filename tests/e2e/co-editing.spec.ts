import { expect, test } from "@playwright/test";
import { SharedEditor } from "./pages/shared-editor";
import { demoAccounts } from "./support/demo-accounts";
import { openAs } from "./support/open-notebook";
import { demoAccounts as demoPeople } from "@/db/demo/people";

const nameOf = (email: string) => demoPeople.find((p) => p.email === email)!.name;

const notebook = "Test-particle orbits around Kestrel-7";

test("two authors type in the same notebook and see each other's text and caret; a reviewer's copy is read-only", async ({ browser }) => {
  // Several browsers, each checking the notebook's steps in its own worker: slow on two cores.
  test.slow();
  const author = await openAs(browser, demoAccounts.author, notebook);
  const coauthor = await openAs(browser, demoAccounts.coauthor, notebook);
  const reviewer = await openAs(browser, demoAccounts.reviewer, notebook);
  const a = new SharedEditor(author);
  const b = new SharedEditor(coauthor);
  const r = new SharedEditor(reviewer);

  const fromA = ` Author note ${Date.now().toString(36)}.`;
  const fromB = ` Co-author note ${Date.now().toString(36)}.`;
  await a.typeAtEndOfFirstParagraph(fromA);
  await b.typeAtEndOfFirstParagraph(fromB);

  await expect(b.text()).toContainText(fromA.trim());
  await expect(a.text()).toContainText(fromB.trim());
  await expect(r.text()).toContainText(fromA.trim());
  await expect(a.storedState()).toHaveText(/Everything is stored on the server/);

  // Each sees the other in the presence list and the other's caret, labelled with their name.
  await expect(a.alsoHere()).toContainText(nameOf(demoAccounts.coauthor));
  await expect(b.alsoHere()).toContainText(nameOf(demoAccounts.author));
  await expect(a.caretOf(nameOf(demoAccounts.coauthor))).toBeVisible();
  await expect(b.caretOf(nameOf(demoAccounts.author))).toBeVisible();

  // The reviewer's editor does not take input.
  await expect(r.text()).toHaveAttribute("contenteditable", "false");
  await expect(reviewer.getByText("Read-only: you can read and follow the verdicts.")).toBeVisible();
});
