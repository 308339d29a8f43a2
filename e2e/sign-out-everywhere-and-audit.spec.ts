import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInHomeownerThroughOutbox, signInStaff } from "./support.ts";

const homeowner = "imogen.c@mail.example"; // seeded homeowner with an e-mail address

test("a homeowner signs out on every device from Settings, after confirming", async ({ browser, page }) => {
  await signInHomeownerThroughOutbox(browser, page, homeowner);
  const laptop = await browser.newContext();
  const laptopPage = await laptop.newPage();
  await signInHomeownerThroughOutbox(browser, laptopPage, homeowner);

  await page.goto("/portal/settings");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Settings");
  await page.getByRole("button", { name: "Sign out everywhere" }).click();
  const dialog = page.getByRole("dialog", { name: "Sign out on every device?" });
  await expect(dialog).toBeVisible();
  await expectNoSeriousA11yViolations(page);
  // Cancelling changes nothing.
  await dialog.getByRole("button", { name: "Cancel" }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Settings");

  await page.getByRole("button", { name: "Sign out everywhere" }).click();
  await dialog.getByRole("button", { name: "Sign out everywhere" }).click();
  await expect(page.getByRole("button", { name: "Send me a sign-in link" })).toBeVisible();

  // The other device is signed out too.
  await laptopPage.reload();
  await expect(laptopPage.getByRole("button", { name: "Send me a sign-in link" })).toBeVisible();
  await laptop.close();
});

test("the audit log reads as sentences and filters by kind", async ({ page }) => {
  await signInStaff(page, "dana@cobblefield.example");
  const list = await page.request.get("/api/customers?q=Cobble Row");
  const { customers } = (await list.json()) as { customers: { id: number; firstName: string }[] };
  const hana = customers.find((c) => c.firstName === "Hana");
  expect(hana, "the seeded homeowner at 19 Cobble Row").toBeDefined();
  // Opening her record is what the log should tell in words.
  expect((await page.request.get(`/api/customers/${hana!.id}`)).ok()).toBe(true);

  await page.goto("/staff/audit");
  await expect(page.getByRole("heading", { level: 1, name: "Audit log" })).toBeVisible();
  const sentence = page.getByText("Dana Whitlow opened the customer record for Hana Sørbye").first();
  await expect(sentence).toBeVisible();
  // No API paths on the page.
  await expect(page.getByText(/\/api\//)).toHaveCount(0);

  await page.getByLabel("Record type").selectOption({ label: "Team changes" });
  await page.getByRole("button", { name: "Show" }).click();
  await expect(page).toHaveURL(/subjectType=team/);
  await expect(page.getByText("Dana Whitlow opened the customer record for Hana Sørbye")).toHaveCount(0);

  await page.getByLabel("Record type").selectOption({ label: "Customers" });
  await page.getByRole("button", { name: "Show" }).click();
  await expect(page.getByText("Dana Whitlow opened the customer record for Hana Sørbye").first()).toBeVisible();
  await expectNoSeriousA11yViolations(page);
});
