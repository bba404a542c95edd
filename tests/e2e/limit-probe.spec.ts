import { expect, test } from "@playwright/test";
import { demoAccounts } from "./support/demo-accounts";
import { signInAndOpen } from "./support/open-notebook";

// Kestrel-7's step 15 is the Schwarzschild effective potential with test mass μ,
// V_eff = −GMμ/r + L²/(2μr²) − GML²/(μc²r³) (Hartle, Gravity (2003) §9.3, from memory): as c → ∞
// the last term vanishes like c^−2 and the Newtonian two stay (Goldstein, Classical Mechanics §3.3).
test("a reader probes the c → ∞ limit of the effective potential: the relativistic term vanishes, the Newtonian terms stay", async ({ page }) => {
  await signInAndOpen(page, demoAccounts.reader, "Test-particle orbits around Kestrel-7");

  await page.getByRole("button", { name: "Probe a limit of step 15" }).click();
  const probe = page.getByRole("region", { name: "Limit probe of step 15" });
  await expect(probe.getByLabel(/Symbol that goes to the limit/)).toHaveValue("c");
  await probe.getByRole("button", { name: "Probe", exact: true }).click();
  await expect(probe.getByText(/vanishes, like/)).toBeVisible({ timeout: 30_000 });
  await expect(probe.getByText(/stays as it is/).first()).toBeVisible();
  await expect(probe).toContainText("not a proof");
});
