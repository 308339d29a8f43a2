import { expect, test, type Page } from "@playwright/test";
import { signInHomeownerThroughOutbox } from "./support.ts";

/**
 * Reading the plan with no signal, and leaving nothing behind when the session ends: the
 * saved copy lives in localStorage, so a shared phone or tablet must not keep it.
 * Lucia's seeded visit is today, so her plan starts today.
 */
const lucia = "lucia.marchetti@mail.example";
const savedCopyKey = "sproutline.portal-cache";

/** The saved copy's query roots, or null when there is none. */
function savedRoots(page: Page): Promise<string[] | null> {
  return page.evaluate((key) => {
    const raw = localStorage.getItem(key);
    if (!raw) return null;
    const queries = (JSON.parse(raw) as { clientState?: { queries?: { queryKey: unknown[] }[] } }).clientState?.queries ?? [];
    return queries.map((q) => String(q.queryKey[0]));
  }, savedCopyKey);
}

test("reads the plan offline, and a session that ends leaves no saved copy on the device", async ({ browser, context, page }) => {
  await signInHomeownerThroughOutbox(browser, page, lucia);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Hello, Lucia");
  // The whole plan is saved for offline reading once the phone is idle.
  await expect.poll(() => savedRoots(page), { timeout: 15_000 }).toEqual(expect.arrayContaining(["plans"]));

  await context.setOffline(true);
  await page.getByRole("navigation", { name: "Places" }).getByRole("link", { name: "Plan" }).click();
  await expect(page.getByText(/^Offline — showing what was saved at/)).toBeVisible();
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await context.setOffline(false);

  // The session ends elsewhere (signed out on another device, or expired); this page learns it on its next load.
  const origin = new URL(page.url()).origin;
  expect((await context.request.post("/api/auth/sign-out", { headers: { Origin: origin } })).status()).toBeLessThan(300);
  await page.reload();
  await page.waitForURL(/\/portal\/sign-in/);
  // Long enough for a throttled save (1 s) to have written anything back.
  await page.waitForTimeout(2_500);
  const left = await savedRoots(page);
  expect(left?.filter((root) => root !== "session") ?? []).toEqual([]);
});
