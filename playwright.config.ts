import { defineConfig } from "@playwright/test";

/** The browser tests' own app instance: port and database apart from the demo's. */
export const E2E_PORT = 3210;
export const E2E_DATABASE_URL = "file:./data/e2e.db";

export default defineConfig({
  testDir: "tests/e2e",
  outputDir: "test-results/e2e",
  // One worker: the machines have two cores, and tests share one database.
  workers: 1,
  fullyParallel: false,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 15_000 },
  reporter: [["list"], ["json", { outputFile: "test-results/playwright.json" }]],
  use: {
    baseURL: `http://localhost:${E2E_PORT}`,
    viewport: { width: 1400, height: 900 },
    screenshot: "only-on-failure",
    trace: "retain-on-failure",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      // No sandbox as root; no background traffic to outside hosts; WebGL through SwiftShader.
      args: [
        "--no-sandbox",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
        "--disable-quic",
        "--enable-unsafe-swiftshader",
      ],
    },
  },
  webServer: {
    command: `node scripts/start-app.mjs --port ${E2E_PORT}`,
    url: `http://localhost:${E2E_PORT}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    env: {
      DATABASE_URL: E2E_DATABASE_URL,
      NEXTAUTH_URL: `http://localhost:${E2E_PORT}`,
      LEEWAY_MODE: "demo",
      // The local SMTP server of the tests, apart from a demo's on 2525.
      SMTP_PORT: "2526",
    },
  },
});
