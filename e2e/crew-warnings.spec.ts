import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInHomeownerThroughOutbox, signInStaff } from "./support.ts";

/**
 * Crew warnings live on the visit form, computed in the browser as the figures are typed, and
 * stay with the crew: the homeowner's Today gets the plain-words version, never the rebuke.
 *
 * Desmond, whom no other browser test signs in, so sign-in links aren't shared between files.
 */
const homeowner = "des.achterberg@mail.example";

test("a seed rate far above the range warns the technician live, and the homeowner's Today shows no crew rebuke", async ({ page, browser }) => {
  // Two sign-ins (staff, then the homeowner through the outbox) and a save: longer than the usual minute.
  test.setTimeout(180_000);
  await signInStaff(page, "marco@cobblefield.example");
  await page.goto("/staff/visits/new");
  await expect(page.getByRole("heading", { level: 1, name: "Log a visit" })).toBeVisible();
  const startOver = page.getByRole("button", { name: "Start a new visit" });
  if (await startOver.isVisible()) await startOver.click();

  const checks = page.getByTestId("visit-warnings");
  await page.getByLabel("Customer").fill("Achterberg");
  await page.getByRole("button", { name: /Desmond Achterberg/ }).click();
  await expect(page.getByLabel("Area treated (ft²)")).toHaveValue("9800");
  await page.getByLabel("Overseeding").check();
  await page.getByRole("button", { name: "Add a seed line" }).click();
  await page.getByLabel("Species").selectOption({ label: "Tall fescue" });
  await page.getByLabel("Share of mix %").fill("100");
  await page.getByLabel("Purity %").fill("98");
  await page.getByLabel("Germination %").fill("90");

  // Tall fescue overseeding: 4–6 lb per 1,000 ft². 12 lb is far above it, a risk.
  const rate = page.getByLabel("Seed rate (lb of bulk seed per 1,000 ft²)");
  await rate.fill("12");
  const seedRateWarning = checks.getByTestId("plan-warning").filter({ hasText: "Seed rate 12 lb per 1,000 ft² is above the usual 4–6 lb" });
  await expect(seedRateWarning).toBeVisible();
  await expect(seedRateWarning).toHaveAttribute("data-severity", "risk");
  await expectNoSeriousA11yViolations(page);

  // Back inside the range, the warning goes at once; over it again, it comes back.
  await rate.fill("5");
  await expect(checks.getByTestId("plan-warning").filter({ hasText: /Seed rate/ })).toHaveCount(0);
  await rate.fill("12");
  await expect(seedRateWarning).toBeVisible();

  await page.getByRole("button", { name: "Save visit" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Visit saved" })).toBeVisible();
  const planId = Number((await page.getByText(/^Care plan \d+ now follows this visit/).textContent())!.match(/Care plan (\d+)/)![1]);

  const home = await browser.newContext();
  const portal = await home.newPage();
  await signInHomeownerThroughOutbox(browser, portal, homeowner);
  // Today follows the plan picked on this device; pick the new one.
  await portal.evaluate((id) => localStorage.setItem("sproutline.planId", String(id)), planId);
  await portal.goto("/portal/");
  await expect(portal.getByText("Your lawn got a generous seeding. Keep watering as planned.")).toBeVisible();
  await expect(portal.getByText(/above the usual|lb per 1,000 ft²/)).toHaveCount(0);
  await home.close();
});
