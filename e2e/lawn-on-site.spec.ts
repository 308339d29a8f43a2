import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

/**
 * Slope and shade noted on the visit form: heavy shade over a sun-grass mix warns the technician
 * live, and the saved visit's plan waters the sloped lawn in short runs.
 *
 * Hana Sørbye, whom no other browser test logs a visit for.
 */
test("slope and shade on the visit form warn live and shape the saved plan", async ({ page }) => {
  test.setTimeout(120_000);
  await signInStaff(page, "marco@cobblefield.example");
  await page.goto("/staff/visits/new");
  // The shared build machine can be slow to load the app's first screen.
  await expect(page.getByRole("heading", { level: 1, name: "Log a visit" })).toBeVisible({ timeout: 30_000 });
  const startOver = page.getByRole("button", { name: "Start a new visit" });
  if (await startOver.isVisible()) await startOver.click();

  await page.getByLabel("Customer").fill("Sørbye");
  await page.getByRole("button", { name: /Hana Sørbye/ }).click();
  await expect(page.getByLabel("Area treated (ft²)")).toHaveValue("3600");
  // Nothing recorded yet for this lawn.
  await expect(page.getByLabel("Slope")).toHaveValue("");
  await expect(page.getByLabel("Slope").locator("option:checked")).toHaveText("Not noted");

  await page.getByLabel("Overseeding").check();
  await page.getByRole("button", { name: "Add a seed line" }).click();
  await page.getByLabel("Species").selectOption({ label: "Kentucky bluegrass" });
  await page.getByLabel("Share of mix %").fill("100");
  await page.getByLabel("Purity %").fill("97");
  await page.getByLabel("Germination %").fill("85");
  await page.getByLabel("Seed rate (lb of bulk seed per 1,000 ft²)").fill("1.5");

  const checks = page.getByTestId("visit-warnings");
  const shadeWarning = checks.getByTestId("plan-warning").filter({ hasText: "Heavy shade, but only 0 % of the mix is shade-tolerant" });
  await expect(shadeWarning).toHaveCount(0);
  await page.getByLabel("Shade").selectOption({ label: "Heavy shade" });
  await expect(shadeWarning).toBeVisible();
  await page.getByLabel("Slope").selectOption({ label: "Steep slope" });
  await expect(checks.getByTestId("plan-warning").filter({ hasText: /erosion-control blanket/ })).toBeVisible();
  await expectNoSeriousA11yViolations(page);

  await page.getByRole("button", { name: "Save visit" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Visit saved" })).toBeVisible();
  const planId = Number((await page.getByText(/^Care plan \d+ now follows this visit/).textContent())!.match(/Care plan (\d+)/)![1]);

  const { plan } = (await (await page.request.get(`/api/plans/${planId}`)).json()) as { plan: { steps: { kind: string; title: string }[] } };
  expect(plan.steps.some((s) => s.kind === "water" && / runs of \d+ minutes per zone/.test(s.title))).toBe(true);

  // The next visit to this lawn shows what is now on record.
  await page.getByRole("button", { name: /Log another visit/ }).click();
  await page.getByLabel("Customer").fill("Sørbye");
  await page.getByRole("button", { name: /Hana Sørbye/ }).click();
  await expect(page.getByLabel("Slope").locator("option:checked")).toHaveText("As recorded: Steep slope");
  await expect(page.getByLabel("Shade").locator("option:checked")).toHaveText("As recorded: Heavy shade");
});
