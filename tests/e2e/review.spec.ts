import { expect, test } from "@playwright/test";
import { RemarksPanel } from "./pages/remarks-panel";
import { SharedEditor } from "./pages/shared-editor";
import { demoAccounts } from "./support/demo-accounts";
import { mailroomAvailable } from "./support/mailroom";
import { openAs } from "./support/open-notebook";

// db/demo: the Vesper-3 Reissner–Nordström draft; its step 17 has a deliberate sign slip in the last term.
const notebook = "Charged-hole orbits: Vesper-3";
const slipped = "V_{\\rm eff} = -\\frac{GM\\mu}{r} + \\frac{\\mu c^2 r_Q^2}{2r^2} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3} - \\frac{L^2 r_Q^2}{2\\mu r^4}";
const fixed = slipped.replace(/- \\frac\{L\^2 r_Q\^2\}/, "+ \\frac{L^2 r_Q^2}");

test("a reviewer remarks on the refuted step; the author is mailed, sees it, fixes the step and settles it", async ({ browser }) => {
  // Several browsers, each checking the notebook's steps in its own worker: slow on two cores.
  test.slow();
  const remark = `The last term of step 17 has the wrong sign (${Date.now().toString(36)}).`;

  const reviewer = await openAs(browser, demoAccounts.reviewer, notebook);
  // A reviewer cannot change the text, but can remark on it.
  await expect(new SharedEditor(reviewer).text()).toHaveAttribute("contenteditable", "false");
  const reviewerRemarks = new RemarksPanel(reviewer);
  await reviewerRemarks.remarkOnStep(17, remark);
  const thread = reviewerRemarks.region().getByRole("article", { name: "Remark thread on step 17" });
  await expect(thread).toContainText(remark);
  await expect(thread.getByRole("status")).toHaveText("Open");

  // The notebook's authors hear of it through the mailroom (the local SMTP server).
  if (await mailroomAvailable(reviewer)) {
    const mails = await (await reviewer.request.get(`/api/mailroom?to=${demoAccounts.coauthor}`)).json();
    expect(mails.messages.some((m: { kind: string; text: string }) => m.kind === "remark" && m.text.includes(remark))).toBe(true);
  }

  const author = await openAs(browser, demoAccounts.coauthor, notebook);
  const authorRemarks = new RemarksPanel(author);
  await expect(authorRemarks.threads()).toContainText(remark);
  await expect(author.getByRole("button", { name: /^Remark on step 17, 1 open/ })).toBeVisible();

  // Fix the sign: triple-click selects the step's LaTeX source, typing replaces it.
  const source = author.getByLabel("LaTeX source of step 17");
  await source.click({ clickCount: 3 });
  await author.keyboard.insertText(fixed);
  await expect(source).toHaveText(fixed);

  const opened = await authorRemarks.openThread("wrong sign");
  await opened.getByRole("button", { name: "Settle" }).click();
  await expect(opened.getByRole("status")).toContainText("Settled by");
  await expect(authorRemarks.threads()).not.toContainText(remark); // the list shows open remarks by default
  await authorRemarks.show("settled remarks");
  await expect(authorRemarks.threads()).toContainText(remark);

  // The reviewer sees the fixed text and the settled thread.
  await expect(reviewer.getByLabel("LaTeX source of step 17")).toHaveText(fixed);
  await reviewer.reload();
  await new SharedEditor(reviewer).waitUntilOpen();
  await reviewerRemarks.show("settled remarks");
  await expect(reviewerRemarks.threads()).toContainText(remark);
});

test("a reader reads remarks but has no remark button", async ({ browser }) => {
  const reader = await openAs(browser, demoAccounts.reader, notebook);
  await expect(new RemarksPanel(reader).region()).toBeVisible();
  await expect(reader.getByRole("button", { name: /^Remark on step/ })).toHaveCount(0);
  await expect(reader.getByRole("button", { name: "Remark on the selected text" })).toHaveCount(0);
});
