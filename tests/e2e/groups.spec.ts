import { expect, test } from "@playwright/test";
import { DashboardPage } from "./pages/dashboard-page";
import { GroupSettingsPage } from "./pages/group-settings-page";
import { SignInPage } from "./pages/sign-in-page";
import { demoAccounts, demoPassword, uniqueEmail } from "./support/demo-accounts";

const demoGroup = "Strong-Field Orbits"; // db/demo: the invented group every demo account belongs to

test("a group lead adds a member, changes the role and removes them again", async ({ page }) => {
  // An account to add: sign-up alone creates it (unconfirmed accounts can be added to a group).
  const email = uniqueEmail("visiting-reviewer");
  const signUp = await page.request.post("/api/auth/signup", { data: { name: "Visiting Reviewer", email, password: "long-enough-password" } });
  expect(signUp.status()).toBe(202);

  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(demoAccounts.lead, demoPassword);
  await new DashboardPage(page).expectLoaded();

  const settings = new GroupSettingsPage(page);
  await settings.openFromDashboard(demoGroup);
  await settings.addMember(email, "reviewer");
  await expect(settings.roleOf("Visiting Reviewer")).toHaveValue("reviewer");

  await settings.roleOf("Visiting Reviewer").selectOption({ label: "author" });
  await page.reload();
  await expect(settings.roleOf("Visiting Reviewer")).toHaveValue("author");

  await settings.remove("Visiting Reviewer");
  await expect(settings.members().getByText(email)).toHaveCount(0);
});

test("members who are not the lead see the roles but cannot change them", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(demoAccounts.reviewer, demoPassword);
  await new DashboardPage(page).expectLoaded();

  const settings = new GroupSettingsPage(page);
  await settings.openFromDashboard(demoGroup);
  await expect(settings.members().getByRole("row")).not.toHaveCount(0);
  await expect(settings.members().getByRole("combobox")).toHaveCount(0);
  await expect(page.getByRole("form", { name: "Add a member" })).toHaveCount(0);
});
