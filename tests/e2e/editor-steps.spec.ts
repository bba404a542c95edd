import { expect, test } from "@playwright/test";
import { DashboardPage } from "./pages/dashboard-page";
import { NotebookPage } from "./pages/notebook-page";
import { NotebookSteps } from "./pages/notebook-steps";
import { SharedEditor } from "./pages/shared-editor";
import { SignInPage } from "./pages/sign-in-page";
import { SpacetimeBlockPanel } from "./pages/spacetime-block";
import { demoAccounts, demoPassword } from "./support/demo-accounts";

// Schwarzschild in (t, r, θ, φ), MTW (1973) eq. 31.1 with r_s = 2GM/c².
const SCHWARZSCHILD = "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2\\,dt^2 + \\left(1-\\frac{r_s}{r}\\right)^{-1}dr^2 + r^2\\,d\\theta^2 + r^2\\sin^2\\theta\\,d\\phi^2";
// The Newtonian effective potential and its derivative (Goldstein, Classical Mechanics, §3.3); the third step doubles the centrifugal term.
const POTENTIAL = "V = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2}";
const DERIVATIVE = "\\frac{dV}{dr} = \\frac{GM\\mu}{r^2} - \\frac{L^2}{\\mu r^3}";
const WRONG = "\\frac{dV}{dr} = \\frac{GM\\mu}{r^2} - \\frac{2L^2}{\\mu r^3}";

test("an author writes a block and three steps and sees verified, verified, refuted with a witness; a reader sees it read-only", async ({ page, browser }) => {
  // Several browsers, each checking the notebook's steps in its own worker: slow on two cores.
  test.slow();
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(demoAccounts.author, demoPassword);
  const dashboard = new DashboardPage(page);
  await dashboard.expectLoaded();
  const title = `Effective potential check ${Date.now().toString(36)}`;
  await dashboard.createNotebook(title);
  await new NotebookPage(page).expectTitle(title);
  const editor = new SharedEditor(page);
  await editor.waitUntilOpen();
  const steps = new NotebookSteps(page);

  // the first step after the opening paragraph, then the block above it
  await editor.text().locator("p").first().click();
  await steps.addStep(1, POTENTIAL, "definition");
  await editor.text().locator("p").first().click();
  await steps.insertSpacetimeBlock();
  const block = new SpacetimeBlockPanel(page);
  await block.setLineElement(SCHWARZSCHILD);
  await expect(block.region).toContainText("r_s");

  await steps.caretAfterStep(1);
  await steps.addStep(2, DERIVATIVE, "differentiate by", "r");
  await steps.caretAfterStep(2);
  await steps.addStep(3, WRONG);

  await steps.expectVerdict(1, "verified");
  await steps.expectVerdict(2, "verified");
  await steps.expectVerdict(3, "refuted");
  await expect(steps.verdict(3)).toContainText("Sides differ at:");
  await expect(editor.storedState()).toHaveText(/Everything is stored on the server/, { timeout: 30_000 });

  // the new block's curvature sheet lists its Christoffel symbols
  const sheet = await block.openCurvatureSheet();
  await expect(sheet.section("Christoffel symbols").getByRole("rowheader").first()).toBeVisible({ timeout: 30_000 });
  await sheet.close();

  // a reader of the group opens the same notebook: same steps and verdicts, no editing
  const url = page.url();
  const readerPage = await (await browser.newContext()).newPage();
  const readerSignIn = new SignInPage(readerPage);
  await readerSignIn.open(new URL(url).pathname);
  await readerSignIn.signIn(demoAccounts.reader, demoPassword);
  const readerEditor = new SharedEditor(readerPage);
  await readerEditor.waitUntilOpen();
  await expect(readerEditor.text()).toHaveAttribute("contenteditable", "false");
  await expect(readerPage.getByText("Read-only: you can read and follow the verdicts.")).toBeVisible();
  const readerSteps = new NotebookSteps(readerPage);
  await readerSteps.expectVerdict(1, "verified");
  await readerSteps.expectVerdict(2, "verified");
  await readerSteps.expectVerdict(3, "refuted");
  await expect(readerPage.getByRole("toolbar", { name: "Insert" })).toHaveCount(0);

  // keys typed into a step's controls stay there: the citation field takes them, the relation does not
  const cites = page.getByLabel("Steps cited by step 3 (numbers)", { exact: true });
  await cites.click();
  await page.keyboard.type("2");
  await expect(cites).toHaveValue("2");
  await page.keyboard.press("Enter");
  await expect(steps.source(3)).toHaveText(WRONG);
  await expect(cites).toHaveValue("2");

  // characters typed in the middle of a relation land at the caret, one after the other, and
  // plain typing never has the page's selection set for it (that would lay the page out per key)
  await steps.source(3).click();
  // the caret four characters before the end, placed directly: End on a relation wrapped over
  // two lines would go to the end of the line clicked, not of the relation
  await page.evaluate(async () => {
    const source = document.querySelector('[aria-label="LaTeX source of step 3"]')!;
    const walker = document.createTreeWalker(source, NodeFilter.SHOW_TEXT);
    let last: Text | null = null;
    for (let node = walker.nextNode(); node; node = walker.nextNode()) last = node as Text;
    const read = new Promise((resolve) => document.addEventListener("selectionchange", resolve, { once: true }));
    document.getSelection()!.collapse(last!, last!.data.length - 4);
    await read;
    await new Promise((resolve) => requestAnimationFrame(resolve));
  });
  await page.evaluate(() => {
    const counted = window as unknown as { caretWrites: number };
    counted.caretWrites = 0;
    for (const name of ["collapse", "setBaseAndExtent", "addRange", "extend"] as const) {
      const original = Selection.prototype[name] as (...args: unknown[]) => void;
      Selection.prototype[name] = function (this: Selection, ...args: unknown[]) {
        counted.caretWrites += 1;
        return original.apply(this, args);
      } as never;
    }
  });
  await page.keyboard.type("+0x");
  await expect(steps.source(3)).toHaveText(`${WRONG.slice(0, -4)}+0x${WRONG.slice(-4)}`);
  expect(await page.evaluate(() => (window as unknown as { caretWrites: number }).caretWrites)).toBe(0);
});
