import { expect, test } from "@playwright/test";
import { signInHomeownerThroughOutbox, signInStaff } from "./support.ts";

/**
 * On a steep lawn each watering is split into short runs. The homeowner's plan shows when each
 * watering starts and how it is split, not every run as a watering of its own.
 *
 * Hana Sørbye: the steep lawn of lawn-on-site.spec.ts; no other file asks her a sign-in link by e-mail.
 */
const homeowner = "hana.sorbye@mail.example";

test("a steep lawn's plan shows each watering once, split into short runs with pauses", async ({ page, browser }) => {
  test.setTimeout(180_000);
  await signInStaff(page, "marco@cobblefield.example");
  const search = (await (await page.request.get("/api/customers?q=Sorbye")).json()) as { customers: { id: number }[] };
  const customer = (await (await page.request.get(`/api/customers/${search.customers[0]!.id}`)).json()) as { properties: { id: number }[] };
  const today = new Date().toLocaleDateString("en-CA", { timeZone: "America/New_York" });
  const saved = await page.request.post("/api/visits", {
    data: {
      propertyId: customer.properties[0]!.id,
      visit: {
        date: today,
        services: ["overseeding"],
        seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }],
        seedRateLbPer1000: 5,
        areaFt2: 3600,
        products: [],
      },
      lawn: { slope: "steep" },
    },
  });
  expect(saved.status()).toBe(201);
  const { planId } = (await saved.json()) as { planId: number };
  const { plan } = (await (await page.request.get(`/api/plans/${planId}`)).json()) as {
    plan: { steps: { kind: string; times?: string[]; cycleAndSoak?: { runsPerCycle: number; soakMinutes: number; cycleStarts: string[] } }[] };
  };
  const split = plan.steps.find((s) => s.kind === "water" && s.cycleAndSoak && s.cycleAndSoak.cycleStarts.length > 1);
  expect(split).toBeDefined();
  const { runsPerCycle, soakMinutes, cycleStarts } = split!.cycleAndSoak!;
  expect(split!.times!.length).toBeGreaterThan(cycleStarts.length);

  const home = await browser.newContext();
  const portal = await home.newPage();
  await signInHomeownerThroughOutbox(browser, portal, homeowner);
  await portal.goto(`/portal/plan/${planId}`);
  const headline = new RegExp(
    `^Water ${cycleStarts.length} times today: [^—]+ — each time in ${runsPerCycle} short runs of \\d+ minutes?( per zone| in each spot you move the sprinkler to)?, with ${soakMinutes}-minute pauses so the water soaks in$`,
  );
  await expect(portal.getByText(headline).first()).toBeVisible({ timeout: 30_000 });
  // No watering is shown as many times a day as it has runs.
  await expect(portal.getByText(new RegExp(`^Water ${split!.times!.length} times today`))).toHaveCount(0);
  await home.close();
});
