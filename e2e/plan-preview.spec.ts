import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

/** Adds days to a "YYYY-MM-DD" calendar date without going through local time. */
function addDays(isoDate: string, days: number): string {
  const date = new Date(`${isoDate}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

test("a manager previews a care plan that follows the form as it changes", async ({ page }) => {
  await signInStaff(page, "dana@cobblefield.example");
  // On a phone the navigation sits behind the menu button; wait for the page before looking.
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  const menu = page.getByRole("button", { name: "Menu" });
  if (await menu.isVisible()) await menu.click();
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Plan preview" }).click();
  await expect(page).toHaveURL(/\/staff\/plan-preview$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Plan preview");

  // The starting example has a plan and no frost warning.
  await expect(page.getByTestId("plan-meta")).toContainText("Care program version");
  const frostWarnings = page.getByTestId("plan-warning").filter({ hasText: /first frost/i });
  await expect(frostWarnings).toHaveCount(0);
  await expectNoSeriousA11yViolations(page);

  // First frost 20 days after the visit: too soon for new seed, a risk.
  const visitDate = await page.getByLabel("Visit date").inputValue();
  await page.getByLabel("Expected first frost (optional)").fill(addDays(visitDate, 20));
  await expect(frostWarnings).toHaveCount(1);
  await expect(frostWarnings).toHaveAttribute("data-severity", "risk");
  await expect(frostWarnings).toContainText("Risk");

  // 4 lb per 1,000 ft² of starter: 24 lb on 6,000 ft², 36 lb on 9,000 ft².
  const product = page.getByTestId("product-figures").first();
  await expect(product).toContainText("24 lb");
  await page.getByLabel("Lawn area treated (ft²)").fill("9000");
  await expect(product).toContainText("36 lb");

  // A mistyped number is kept as typed and marked in place; the last plan stays.
  await page.getByLabel("Lawn area treated (ft²)").fill("90o0");
  await expect(page.getByText("Enter a number, such as 4.5").first()).toBeVisible();
  await expect(page.getByLabel("Lawn area treated (ft²)")).toHaveValue("90o0");
  await expect(product).toContainText("36 lb");

  await expectNoSeriousA11yViolations(page);
});
