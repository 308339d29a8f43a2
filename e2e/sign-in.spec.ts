import { expect, test } from "@playwright/test";
import { chooseGoogleAccount, expectNoSeriousA11yViolations, signInHomeownerThroughOutbox, signInStaff } from "./support.ts";

test("a homeowner signs in with a link read from the outbox and lands on their home page", async ({ browser, page }) => {
  await signInHomeownerThroughOutbox(browser, page, "ruth.okonkwo@mail.example");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Hello, Ruth");
  await expect(page.getByText("Your care plan from Cobblefield Turf Care")).toBeVisible();
  await expectNoSeriousA11yViolations(page);

  await page.getByRole("button", { name: /sign out/i }).first().click();
  await page.waitForURL(/\/portal\/sign-in/);
  await page.goto("/portal/");
  await page.waitForURL(/\/portal\/sign-in/);
});

test("a technician signs in through the local Google page and sees the role", async ({ page }) => {
  await signInStaff(page, "marco@cobblefield.example");
  await expect(page.getByTestId("staff-role")).toHaveText(/technician/i);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await expectNoSeriousA11yViolations(page);
});

test("a manager signs in and the role says manager", async ({ page }) => {
  await signInStaff(page, "dana@cobblefield.example");
  await expect(page.getByTestId("staff-role")).toHaveText(/manager/i);
});

test("someone not on the staff list is refused with a clear page", async ({ page }) => {
  await chooseGoogleAccount(page, "visitor@elsewhere.example");
  await expect(page).toHaveURL(/\/staff\/sign-in\?error=not_staff/);
  await expect(page.getByText(/isn.t on the staff list of Cobblefield Turf Care/i)).toBeVisible();
  await expectNoSeriousA11yViolations(page);
});

test("the portal sign-in page has no serious accessibility problems at phone width", async ({ page }) => {
  await page.goto("/portal/sign-in");
  await expectNoSeriousA11yViolations(page);
});
