import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

/*
 * A manager adds a place's rules on a phone, sees in the sample plan what they change, saves
 * and deletes it again. The rules are invented for the test, not any real place's.
 */
test("a manager adds a place, sees its effect on a sample plan, and deletes it", async ({ page }) => {
  await signInStaff(page, "dana@cobblefield.example");
  await page.goto("/staff/places");
  await expect(page.getByRole("heading", { level: 1, name: "Places" })).toBeVisible();
  await expect(page.getByText(/Sproutline applies what you enter/)).toBeVisible();
  // The seeded example says it is one.
  const example = page.getByRole("listitem").filter({ has: page.getByRole("heading", { name: /Example place/ }) });
  await expect(example.getByText("Example", { exact: true })).toBeVisible();

  await page.getByRole("button", { name: "Add a place" }).click();
  // Saving an empty form says why, where the keyboard is.
  await page.getByRole("button", { name: "Add place" }).click();
  await expect(page.getByText("Fix the marked rules to save.")).toBeVisible();
  await expect(page.getByText("Fix the marked rules to save.").locator("xpath=../..")).toBeFocused();
  await expect(page.getByText("Name the place")).toBeVisible();
  await page.getByLabel("Name").fill("Test county (e2e)");
  await page.getByLabel("State").fill("OH");
  await page.getByLabel("ZIP codes starting with").fill("44990");
  await page.getByRole("button", { name: "Add a blackout window" }).click();
  await page.getByLabel("From month").selectOption({ label: "September" });
  await page.getByLabel("From day").fill("1");
  await page.getByLabel("To month").selectOption({ label: "September" });
  await page.getByLabel("To day").fill("20");
  await page.getByLabel("Watering is allowed only on some days").check();
  for (const day of ["Monday", "Wednesday", "Saturday"]) await page.getByLabel(day, { exact: true }).check();

  // An overseeding on Thursday, September 10, 2026: the plan's starter feed (Friday the 11th)
  // waits for the window to end; the new seed's daily watering meets the watering days.
  await page.getByLabel("Visit date").fill("2026-09-10");
  const sample = page.getByRole("region", { name: "Sample plan" });
  await expect(sample.getByText("Fri, Sep 11 → Mon, Sep 21")).toBeVisible({ timeout: 15_000 });
  await expect(sample.getByText(/Homeowner reads: .*only on Monday, Wednesday and Saturday/)).toBeVisible();
  await expectNoSeriousA11yViolations(page);

  await page.getByRole("button", { name: "Add place" }).click();
  await expect(page.getByText(/Saved Test county \(e2e\)/)).toBeVisible();
  const card = page.getByRole("listitem").filter({ has: page.getByRole("heading", { name: "Test county (e2e)" }) });
  await expect(card.getByText("No fertilizer September 1 – September 20")).toBeVisible();
  await expect(card.getByText(/Watering only Mon, Wed, Sat/)).toBeVisible();

  await card.getByRole("button", { name: "Delete Test county (e2e)" }).click();
  const dialog = page.getByRole("dialog");
  await expect(dialog).toContainText("Delete Test county (e2e)?");
  await dialog.getByRole("button", { name: "Delete place" }).click();
  await expect(page.getByText(/Deleted Test county \(e2e\)/)).toBeVisible();
  await expect(page.getByRole("heading", { name: "Test county (e2e)" })).toHaveCount(0);
});

test("a technician reads the places' rules but cannot change them", async ({ page }) => {
  await signInStaff(page, "marco@cobblefield.example");
  await page.goto("/staff/places");
  await expect(page.getByRole("heading", { level: 1, name: "Places" })).toBeVisible();
  await expect(page.getByRole("heading", { name: /Example place/ })).toBeVisible();
  await expect(page.getByRole("button", { name: "Add a place" })).toHaveCount(0);
  await expect(page.getByRole("button", { name: /^Edit / })).toHaveCount(0);
  await expect(page.getByRole("button", { name: /^Delete / })).toHaveCount(0);
});
