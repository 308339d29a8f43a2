import { expect, test, type Page } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

/**
 * What the visit form asks that decides the plan: the lawn's condition today, a weed preventer put
 * down before a seeding, and whether a fertilizer is organic. Checked at phone width, live (the
 * warnings the engine gives in the browser) and in what the form sends on save.
 *
 * Walt Fenwick, whom no other browser test uses; he takes no e-mail, so no sign-in link is spent.
 */
const technician = "marco@cobblefield.example";

// A sign-in, a form typed at phone speed and a save: longer than the usual minute.
test.describe.configure({ timeout: 150_000 });

async function openFormFor(page: Page, search: string, name: RegExp) {
  await signInStaff(page, technician);
  await page.goto("/staff/visits/new");
  // The first page of a freshly started stack on a busy machine can take a while to load its chunks.
  await expect(page.getByRole("heading", { level: 1, name: "Log a visit" })).toBeVisible({ timeout: 30_000 });
  const startOver = page.getByRole("button", { name: "Start a new visit" });
  if (await startOver.isVisible()) await startOver.click();
  await page.getByLabel("Customer").fill(search);
  await page.getByRole("button", { name }).click();
  await expect(page.getByLabel("Area treated (ft²)")).toHaveValue("12000");
}

async function addTallFescue(page: Page) {
  await page.getByRole("button", { name: "Add a seed line" }).click();
  await page.getByLabel("Species").selectOption({ label: "Tall fescue" });
  await page.getByLabel("Share of mix %").fill("100");
  await page.getByLabel("Purity %").fill("98");
  await page.getByLabel("Germination %").fill("90");
  await page.getByLabel("Seed rate (lb of bulk seed per 1,000 ft²)").fill("5");
}

/** YYYY-MM-DD `days` before an ISO date, in whole calendar days. */
function daysBefore(iso: string, days: number): string {
  const d = new Date(`${iso}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() - days);
  return d.toISOString().slice(0, 10);
}

test("a seeding asks about a weed preventer put down before, and warns live when it may still stop the seed", async ({ page }) => {
  await openFormFor(page, "Fenwick", /Walt Fenwick/);
  const question = page.getByRole("group", { name: "Weed preventer before seeding" });
  // Only asked once seed goes down.
  await expect(question).toHaveCount(0);
  await page.getByLabel("Overseeding").check();
  await addTallFescue(page);
  await expect(question).toBeVisible();

  await question.getByRole("radio", { name: "Yes" }).check();
  await question.getByLabel("What went down").selectOption("crabgrass_preventer");
  const visitDate = await page.getByLabel("Date", { exact: true }).inputValue();
  // Six weeks before: inside a crabgrass preventer's usual 8–16 week label interval (from memory).
  const appliedOn = daysBefore(visitDate, 42);
  await question.getByLabel("When it went down").fill(appliedOn);
  await question.getByLabel("Active ingredient (optional, from the bag)").selectOption("prodiamine");

  const warning = page.getByTestId("visit-warnings").getByTestId("plan-warning").filter({ hasText: "A crabgrass preventer went down 6 weeks before this seeding" });
  await expect(warning).toBeVisible();
  await expect(warning).toHaveAttribute("data-severity", "risk");
  await expectNoSeriousA11yViolations(page);

  // Siduron is labelled for use at seeding on some products: the risk gives way to a note to check the label.
  await question.getByLabel("Active ingredient (optional, from the bag)").selectOption("siduron");
  await expect(warning).toHaveCount(0);
  await expect(page.getByTestId("visit-warnings").getByTestId("plan-warning").filter({ hasText: "contains siduron" })).toBeVisible();
  await question.getByLabel("Active ingredient (optional, from the bag)").selectOption("prodiamine");

  // Saving sends the answer with the visit; the form's own "yes" stays on the device.
  const sent = page.waitForRequest((r) => r.url().endsWith("/api/visits") && r.method() === "POST");
  await page.getByRole("button", { name: "Save visit" }).click();
  const body = (await sent).postDataJSON() as { visit: { priorPreEmergent?: unknown } };
  expect(body.visit.priorPreEmergent).toEqual({ product: "crabgrass_preventer", appliedOn, activeIngredient: "prodiamine" });
  await expect(page.getByRole("heading", { level: 1, name: "Visit saved" })).toBeVisible();
});

test("a lawn found thick is offered the fall feeding instead of seed, and a product can be ticked organic", async ({ page }) => {
  await openFormFor(page, "Fenwick", /Walt Fenwick/);
  const condition = page.getByLabel("Lawn condition");
  // Filled in from the lawn's record.
  await expect(condition).toHaveValue("thin");
  await page.getByLabel("Overseeding").check();
  await addTallFescue(page);
  await expect(page.getByTestId("thick-lawn-notice")).toHaveCount(0);

  await condition.selectOption("thick");
  const notice = page.getByTestId("thick-lawn-notice");
  await expect(notice).toContainText("about 2 lb of nitrogen per 1,000 ft² over the fall");
  await expect(page.getByTestId("visit-warnings").getByTestId("plan-warning").filter({ hasText: "This lawn is recorded as thick: seed isn't needed." })).toBeVisible();
  await expectNoSeriousA11yViolations(page);

  await notice.getByRole("button", { name: "Log a fall feeding instead of seed" }).click();
  await expect(page.getByLabel("Overseeding")).not.toBeChecked();
  await expect(page.getByLabel(/Fertili[sz]er only/)).toBeChecked();
  await expect(page.getByLabel("Species")).toHaveCount(0);
  await expect(page.getByRole("group", { name: "Weed preventer before seeding" })).toHaveCount(0);
  await expect(notice.getByRole("button")).toHaveCount(0);

  await page.getByRole("button", { name: "Add a product" }).click();
  await page.getByLabel("Name on the bag").fill("Natural lawn food 6-4-0");
  await page.getByLabel("N %").fill("6");
  await page.getByLabel("P %").fill("4");
  await page.getByLabel("K %").fill("0");
  await page.getByLabel("Rate (lb per 1,000 ft²)").fill("12");
  await page.getByLabel("Organic (natural) fertilizer").check();

  const sent = page.waitForRequest((r) => r.url().endsWith("/api/visits") && r.method() === "POST");
  await page.getByRole("button", { name: "Save visit" }).click();
  const body = (await sent).postDataJSON() as { lawn?: { lawnCondition?: string }; visit: { services: string[]; seedMix: unknown[]; products: { organic?: boolean }[]; priorPreEmergent?: unknown } };
  expect(body.lawn?.lawnCondition).toBe("thick");
  expect(body.visit.services).toEqual(["fertiliser_only"]);
  expect(body.visit.seedMix).toEqual([]);
  expect(body.visit.products[0]?.organic).toBe(true);
  expect(body.visit.priorPreEmergent).toBeUndefined();
  await expect(page.getByRole("heading", { level: 1, name: "Visit saved" })).toBeVisible();
});
