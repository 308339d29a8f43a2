import { defineConfig } from "@playwright/test";

/**
 * Browser tests run against a server that `npm test` starts (scripts/test.ts) and pass
 * in E2E_BASE_URL. Debian's Chromium is used; Playwright's own download cannot work here.
 */
export default defineConfig({
  testDir: "e2e",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  reporter: [["list"]],
  use: {
    baseURL: process.env.E2E_BASE_URL ?? "http://localhost:5190",
    trace: "retain-on-failure",
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
  projects: [
    { name: "phone", use: { viewport: { width: 360, height: 780 }, isMobile: true, hasTouch: true } },
  ],
});
