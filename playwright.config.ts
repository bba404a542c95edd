import os from "node:os";
import path from "node:path";
import { defineConfig, devices } from "@playwright/test";

const port = Number(process.env.E2E_PORT ?? 3100);
const baseURL = `http://localhost:${port}`;
// A fresh database for every run, outside the repository; the webServer command wipes it before starting.
const dataDir = process.env.E2E_DATA_DIR ?? path.join(os.tmpdir(), "vierbein-e2e-data");

export default defineConfig({
  testDir: "tests/e2e",
  fullyParallel: false,
  workers: 1,
  forbidOnly: !!process.env.CI,
  retries: 0,
  reporter: process.env.CI ? [["list"], ["html", { open: "never", outputFolder: "playwright-report" }]] : "list",
  timeout: 60_000,
  expect: { timeout: 10_000 },
  use: {
    baseURL,
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
  },
  projects: [
    {
      name: "chromium",
      use: {
        ...devices["Desktop Chrome"],
        viewport: { width: 1280, height: 860 },
        // Debian's Chromium; never a downloaded browser.
        launchOptions: {
          executablePath: "/usr/bin/chromium",
          args: [
            "--no-sandbox",
            "--disable-gpu",
            "--disable-background-networking",
            "--disable-component-update",
            "--disable-sync",
            "--no-first-run",
            "--disable-quic",
          ],
        },
      },
    },
  ],
  webServer: {
    // The production build through the custom server, on a wiped data folder with the demo loaded.
    // E2E_SKIP_BUILD=1 reuses an existing .next build when iterating locally.
    command: `rm -rf "${dataDir}" && ${process.env.E2E_SKIP_BUILD ? "" : "npm run build && "}npm run db:demo && npm start`,
    url: `${baseURL}/api/health`,
    reuseExistingServer: !process.env.CI && !!process.env.E2E_REUSE_SERVER,
    timeout: 600_000,
    stdout: "pipe",
    stderr: "pipe",
    gracefulShutdown: { signal: "SIGTERM", timeout: 5000 },
    env: {
      PORT: String(port),
      DATA_DIR: dataDir,
      NEXTAUTH_URL: baseURL,
      NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET ?? "e2e-only-secret-not-for-production",
      NODE_ENV: "production",
    },
  },
});
