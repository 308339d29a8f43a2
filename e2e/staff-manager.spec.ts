import { expect, test, type Page } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

const MANAGER = "dana@cobblefield.example";
const TECHNICIAN = "marco@cobblefield.example";
const SEEDING = ["overseeding", "slit_seeding", "new_seeding"];

const managerScreens = [
  { path: "/staff/follow-ups", heading: "Follow-up visits" },
  { path: "/staff/reports/callbacks", heading: "Callback report" },
  { path: "/staff/programs", heading: "Care programs" },
  { path: "/staff/team", heading: "Team" },
  { path: "/staff/import", heading: "Import visits" },
  { path: "/staff/audit", heading: "Audit log" },
  { path: "/staff/unmatched", heading: "Unmatched messages" },
  { path: "/staff/company", heading: "Company profile" },
];

type PlanHeader = { id: number; propertyId: number; visitDate: string; services: string[] };

/**
 * A care plan that came from a seeding visit, found through the API as the staff app
 * sees it. Its visit date is the report range, so the new callback must count there.
 */
async function findSeedingPlan(page: Page): Promise<{ plan: PlanHeader; customerName: string }> {
  const list = await page.request.get("/api/customers");
  expect(list.ok()).toBe(true);
  const { customers } = (await list.json()) as { customers: { id: number; firstName: string; lastName: string; activePlans: number }[] };
  for (const customer of customers.filter((c) => c.activePlans > 0)) {
    const detail = await page.request.get(`/api/customers/${customer.id}`);
    const { plans } = (await detail.json()) as { plans: PlanHeader[] };
    const plan = plans.find((p) => p.services.some((s) => SEEDING.includes(s)));
    if (plan) return { plan, customerName: `${customer.firstName} ${customer.lastName}` };
  }
  throw new Error("The demo data has no care plan from a seeding visit");
}

/** The headline figure and its line ("… 3 callbacks after 19 seeding visits"). */
async function readCallbackRate(page: Page) {
  const figure = page.getByTestId("headline-callback-rate");
  await expect(figure).toBeVisible();
  // Wait for the report itself, not a previous range's figures shown while it loads.
  await expect(page.locator("[aria-busy=true]")).toHaveCount(0);
  const value = (await page.getByTestId("headline-callback-rate-value").textContent())!.trim();
  const detail = (await figure.textContent())!;
  const callbacks = Number(/(\d+) callbacks? after/.exec(detail)?.[1]);
  return { value, callbacks };
}

test("a manager records a callback and sees the callback rate change in the report", async ({ page }) => {
  await signInStaff(page, MANAGER);
  const { plan, customerName } = await findSeedingPlan(page);

  // A follow-up visit booked on that lawn, not (yet) a callback: as a technician would book it from a question.
  const created = await page.request.post("/api/follow-ups", { data: { propertyId: plan.propertyId, planId: plan.id, reason: "other" } });
  expect(created.status()).toBe(201);

  const reportUrl = `/staff/reports/callbacks?from=${plan.visitDate}&to=${plan.visitDate}`;
  await page.goto(reportUrl);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Callback report");
  const before = await readCallbackRate(page);

  // Newest first, so the follow-up just booked is the first card.
  await page.goto("/staff/follow-ups?sort=createdAt&order=desc");
  await page.getByRole("button", { name: `Edit for ${customerName}` }).first().click();
  const dialog = page.getByRole("dialog", { name: `Follow-up for ${customerName}` });
  await expect(dialog).toBeVisible();
  await dialog.getByLabel("Reason", { exact: true }).selectOption({ label: "No germination" });
  await dialog.getByLabel("This is a callback").check();
  await dialog.getByLabel("Labor hours").fill("1.5");
  await dialog.getByLabel("Materials cost ($)").fill("24.50");
  await dialog.getByRole("button", { name: "Save" }).click();
  await expect(dialog).toBeHidden();
  const card = page.getByRole("listitem").filter({ hasText: customerName }).first();
  await expect(card).toContainText("Callback");
  await expect(card).toContainText("1.5 h");

  await page.goto(reportUrl);
  const after = await readCallbackRate(page);
  expect(after.callbacks).toBe(before.callbacks + 1);
  expect(after.value).not.toBe(before.value);
  await expect(page.getByRole("region", { name: /Callbacks by reason/ })).toContainText("No germination");
});

for (const screen of managerScreens) {
  test(`${screen.heading} passes the accessibility checks`, async ({ page }) => {
    await signInStaff(page, MANAGER);
    await page.goto(screen.path);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText(screen.heading);
    // Check the screen with its data, not its loading state.
    await expect(page.getByRole("status").filter({ hasText: /Loading|Working out|Checking your sign-in/ })).toHaveCount(0);
    await expectNoSeriousA11yViolations(page);
  });
}

test("technicians don't see manager screens and get a plain answer if they open one", async ({ page }) => {
  await signInStaff(page, TECHNICIAN);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  const menu = page.getByRole("button", { name: "Menu" });
  if (await menu.isVisible()) await menu.click();
  const nav = page.getByRole("navigation", { name: "Main" });
  await expect(nav.getByRole("link", { name: "Home" })).toBeVisible();
  for (const label of ["Follow-ups", "Unmatched messages", "Callback report", "Programs", "Team", "Company profile", "Import", "Audit log"]) {
    await expect(nav.getByRole("link", { name: label, exact: true })).toHaveCount(0);
  }
  await page.goto("/staff/reports/callbacks");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Managers only");
  await expectNoSeriousA11yViolations(page);
});
