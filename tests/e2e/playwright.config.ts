import { defineConfig } from "@playwright/test";

// Drives Debian's Chromium (installed by scripts/ensure-chromium.sh): no browser download.
export default defineConfig({
  testDir: ".",
  testMatch: /.*\.spec\.ts/,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  outputDir: "../artifacts/e2e-results",
  reporter: [["list"]],
  use: {
    baseURL: process.env.TEST_APP_URL ?? "http://localhost:3100",
    screenshot: "only-on-failure",
    trace: "off",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: [
        "--headless",
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
