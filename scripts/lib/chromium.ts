import { execFileSync } from "node:child_process";
import { existsSync } from "node:fs";

export const chromiumPath = "/usr/bin/chromium";

/** Browser tests use Debian's Chromium; Playwright's own browser download cannot work here. */
export function ensureChromium() {
  if (existsSync(chromiumPath)) return;
  if (process.getuid?.() !== 0) {
    throw new Error("Chromium is missing. Install it once with: sudo apt-get update && sudo apt-get install -y chromium");
  }
  process.stdout.write("[test] installing Chromium from Debian's packages…\n");
  execFileSync("apt-get", ["update"], { stdio: "inherit" });
  execFileSync("apt-get", ["install", "-y", "--no-install-recommends", "chromium"], {
    stdio: "inherit",
    env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" },
  });
}
