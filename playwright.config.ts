import { defineConfig } from "@playwright/test";

// Browser tests drive Debian's chromium (never a downloaded browser) against the production build that
// scripts/test.sh starts on a fresh, seeded database.
export default defineConfig({
  testDir: "tests/e2e",
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [["list"], ["json", { outputFile: `${process.env.RUN_DIR ?? ".run/test"}/results-e2e.json` }]],
  outputDir: `${process.env.RUN_DIR ?? ".run/test"}/e2e-output`,
  use: {
    baseURL: process.env.E2E_BASE_URL ?? "http://localhost:3100",
    trace: "off",
    screenshot: "only-on-failure",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    },
  },
});
