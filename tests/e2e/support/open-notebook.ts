import type { Browser, Page } from "@playwright/test";
import { DashboardPage } from "../pages/dashboard-page";
import { SharedEditor } from "../pages/shared-editor";
import { SignInPage } from "../pages/sign-in-page";
import { demoPassword } from "./demo-accounts";

/** Signs in as a demo account, opens the notebook from the dashboard and waits until its shared editor is up. */
export async function signInAndOpen(page: Page, email: string, title: string): Promise<void> {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, demoPassword);
  const dashboard = new DashboardPage(page);
  await dashboard.expectLoaded();
  await dashboard.openNotebook(title);
  await new SharedEditor(page).waitUntilOpen();
}

/** The same in a browser context of its own, so several people can have the notebook open at once. */
export async function openAs(browser: Browser, email: string, title: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signInAndOpen(page, email, title);
  return page;
}
