import { expect, type Browser, type Page } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";

/** Starts Google sign-in from the staff app and picks an account on the local fake page. */
export async function chooseGoogleAccount(page: Page, email: string) {
  await page.goto("/staff/sign-in");
  await page.getByRole("link", { name: "Sign in with Google" }).click();
  await page.getByRole("button", { name: new RegExp(email.replace(/\./g, "\\.")) }).click();
}

/** Signs a staff member in through the local fake Google page. */
export async function signInStaff(page: Page, email: string) {
  await chooseGoogleAccount(page, email);
  await page.waitForURL(/\/staff\/?$/);
}

/**
 * Asks for a homeowner's sign-in link in the portal, then reads it from the staff outbox
 * in a separate browser context, as a demo would.
 */
export async function signInHomeownerThroughOutbox(browser: Browser, page: Page, contact: string) {
  await page.goto("/portal/sign-in");
  await page.getByLabel("E-mail address or mobile number").fill(contact);
  await page.getByRole("button", { name: "Send me a sign-in link" }).click();
  await expect(page.getByRole("heading", { name: /check your messages/i })).toBeVisible();

  const staff = await browser.newContext();
  const staffPage = await staff.newPage();
  await signInStaff(staffPage, "dana@cobblefield.example");
  await staffPage.goto("/staff/outbox");
  // The newest message to this contact that carries a sign-in link (reminders may arrive too).
  const signInLink = staffPage.getByRole("link", { name: /\/portal\/sign-in\/verify/ });
  const message = staffPage.getByTestId("outbox-message").filter({ hasText: contact }).filter({ has: signInLink }).first();
  const link = message.getByRole("link", { name: /\/portal\/sign-in\/verify/ }).first();
  await expect(link).toBeVisible({ timeout: 15_000 });
  const href = await link.getAttribute("href");
  await staff.close();

  await page.goto(href!);
  await page.waitForURL(/\/portal\/?$/);
}

/** No serious or critical accessibility violations on the current page. */
export async function expectNoSeriousA11yViolations(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
}
