import { expect, test } from "@playwright/test";
import { SpacetimeBlockPanel } from "./pages/spacetime-block";
import { demoAccounts } from "./support/demo-accounts";
import { signInAndOpen } from "./support/open-notebook";

test("an author opens the curvature sheet and the orbit panel of the Kestrel-7 spacetime block", async ({ page }) => {
  await signInAndOpen(page, demoAccounts.author, "Test-particle orbits around Kestrel-7");
  const block = new SpacetimeBlockPanel(page, /Kestrel-7 exterior/);

  const sheet = await block.openCurvatureSheet();
  const christoffel = sheet.section("Christoffel symbols");
  await expect(christoffel).toBeVisible({ timeout: 30_000 });
  // Schwarzschild has 9 independent non-zero Γ^a_{bc} with b ≤ c in (t, r, θ, φ) (MTW (1973) Exercise 14.13; Carroll (2004) eq. 5.33)
  await expect(christoffel.getByRole("rowheader")).toHaveCount(9);
  // Ricci-flat, and K = 12 r_s²/r⁶ (MTW (1973) §31.2)
  await expect(sheet.section("Ricci tensor")).toContainText("a vacuum solution");
  await expect(sheet.section("Kretschmann scalar")).toContainText("12");
  await expect(sheet.conventions()).toContainText("each displayed form was checked numerically against the unsimplified result");
  await sheet.close();

  const panel = await block.openOrbitPanel();
  // with r_s = 1 (m = 1/2): ISCO = 6GM/c² = 3, photon sphere 3GM/c² = 1.5, marginally bound 4GM/c² = 2
  // (Hartle, Gravity (2003) ch. 9; Bardeen, Press & Teukolsky, ApJ 178, 347 (1972))
  await expect(panel.number("ISCO")).toContainText("r = 3.0000 (6.0000 m)", { timeout: 30_000 });
  await expect(panel.number("Photon sphere")).toContainText("r = 1.5000 (3.0000 m)");
  await expect(panel.number("Marginally bound orbit")).toContainText("r = 2.0000 (4.0000 m)");
  await expect(panel.potentialPlot()).toBeVisible();
  await expect(panel.orbitPlot()).toBeVisible();
  await expect(panel.numbers()).toContainText("first-order formula 6πm / (a(1 − e²))");
  await expect(panel.numbers()).toContainText("numerical integration of the exact orbit equation");
});
