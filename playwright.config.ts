import { defineConfig, devices } from "@playwright/test";

// Debian's Chromium, started with the flags this closed network needs; never a downloaded browser.
export default defineConfig({
  testDir: "tests/e2e",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  outputDir: ".data/test/playwright",
  use: {
    baseURL: process.env.E2E_BASE_URL || "http://127.0.0.1:3100",
    trace: "off",
    screenshot: "only-on-failure",
    // Each test starts from a browser with nothing kept; the offline spec lets the service worker in.
    serviceWorkers: "block",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH || "/usr/bin/chromium",
      args: [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--disable-quic",
        "--no-first-run",
      ],
    },
  },
  projects: [{ name: "desktop", use: { ...devices["Desktop Chrome"], channel: undefined } }],
});
