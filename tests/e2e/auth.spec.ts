import { expect, test } from "@playwright/test";
import { DashboardPage } from "./pages/dashboard-page";
import { NotebookPage } from "./pages/notebook-page";
import { SignInPage } from "./pages/sign-in-page";
import { SignUpPage } from "./pages/sign-up-page";
import { confirmEmailFromMailroom, mailroomAvailable } from "./support/mailroom";
import { demoAccounts, demoPassword, uniqueEmail } from "./support/demo-accounts";

test("a visitor signs up and cannot sign in with a password before confirming the address", async ({ page }) => {
  const email = uniqueEmail("unconfirmed");
  const password = "another-long-password";
  const signUp = new SignUpPage(page);
  await signUp.open();
  await signUp.signUp({ name: "Unconfirmed Person", email, password });
  await expect(signUp.confirmation()).toContainText(email);

  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, password);
  await expect(signIn.problem()).toContainText("Confirm your e-mail address first");
  await expect(page).toHaveURL(/\/sign-in/);
});

test("a newcomer confirms the address, signs in, starts a group and creates a notebook", async ({ page }) => {
  test.skip(!(await mailroomAvailable(page)), "needs the mailroom API (GET /api/mailroom) to read the confirmation link");
  const email = uniqueEmail("newcomer");
  const password = "a-long-enough-password";

  const signUp = new SignUpPage(page);
  await signUp.open();
  await signUp.signUp({ name: "Ada Newcomer", email, password });
  await expect(signUp.confirmation()).toContainText(email);
  await confirmEmailFromMailroom(page, email);

  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, password);
  const dashboard = new DashboardPage(page);
  await dashboard.expectLoaded();
  await expect(page.getByText("Welcome back, Ada Newcomer.")).toBeVisible();

  // A newcomer belongs to no group, so there is nowhere to put a notebook until they start one.
  await expect(dashboard.newNotebookButton).toHaveCount(0);
  await dashboard.startGroup("Newcomer's orbit group");
  await dashboard.createNotebook("First light-deflection note");
  await new NotebookPage(page).expectTitle("First light-deflection note");
});

test("a wrong password is refused without saying whether the account exists", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(demoAccounts.author, "not-the-password");
  await expect(signIn.problem()).toContainText("do not match");
  await expect(page).toHaveURL(/\/sign-in/);

  await signIn.signIn("nobody-here@example.test", "not-the-password");
  await expect(signIn.problem()).toContainText("do not match");
});

test("signed-out visitors are sent to sign in and come back afterwards", async ({ page }) => {
  await page.goto("/dashboard");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=(%2F|\/)dashboard/);
  await new SignInPage(page).signIn(demoAccounts.lead, demoPassword);
  await new DashboardPage(page).expectLoaded();
});
