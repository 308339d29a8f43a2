import { expect as baseExpect, test, type BrowserContext, type Page } from "@playwright/test";
import sharp from "sharp";
import { expectNoSeriousA11yViolations, signInHomeownerThroughOutbox, signInStaff } from "./support.ts";

/**
 * The company, not the tool, talks to the homeowner: a technician's answer shows up as a
 * count on the Messages tab and a notice on Today until it is read; the header carries the
 * company's logo, name and office phone (seeded as (330) 555-0100).
 *
 * Felix rather than Ruth or Imogen: other files sign them in, and sign-in links are limited per contact.
 */
const homeowner = "felix.ahlgren@mail.example";
// Screens load lazily and the first load of a page can take several seconds on a busy test machine.
const expect = baseExpect.configure({ timeout: 20_000 });
const company = "Cobblefield Turf Care";

type SignedIn = Awaited<ReturnType<BrowserContext["storageState"]>>;
let homeownerState: SignedIn;

test.beforeAll(async ({ browser }) => {
  const context = await browser.newContext();
  await signInHomeownerThroughOutbox(browser, await context.newPage(), homeowner);
  homeownerState = await context.storageState();
  await context.close();
});

test.beforeEach(async ({ context }) => {
  await context.addCookies(homeownerState.cookies);
});

/** Reading every thread through the API marks it read, so the test starts with nothing new. */
async function readAllThreads(page: Page): Promise<number[]> {
  const { plans } = (await (await page.request.get("/api/my/plans")).json()) as { plans: { id: number }[] };
  for (const plan of plans) expect((await page.request.get(`/api/plans/${plan.id}/thread`)).status()).toBe(200);
  return plans.map((p) => p.id);
}

/** The bottom bar, as on a phone ("Places"); the header's copy of the links is hidden at this width. */
function places(page: Page) {
  return page.getByRole("navigation", { name: "Places" });
}

function messagesTab(page: Page) {
  return places(page).getByRole("link", { name: /^Messages/ });
}

test("a technician's answer is marked new on the Messages tab and Today until the homeowner opens it", async ({ page, browser }) => {
  await page.goto("/portal/");
  const [planId] = await readAllThreads(page);
  await page.reload();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Hello, Felix");
  await expect(messagesTab(page)).toHaveAccessibleName("Messages");
  await expect(page.getByText(`${company} wrote back`)).toHaveCount(0);

  // The technician answers through the API, as the staff app does.
  const answer = `Your lawn is dormant, not dead: it greens up with fall rain. (${Date.now().toString(36)})`;
  const staff = await browser.newContext();
  const staffPage = await staff.newPage();
  await signInStaff(staffPage, "marco@cobblefield.example");
  const origin = new URL(staffPage.url()).origin;
  const posted = await staffPage.request.post(`/api/plans/${planId}/answers`, { multipart: { text: answer }, headers: { Origin: origin } });
  expect(posted.status()).toBe(201);
  await staff.close();

  await page.reload();
  await expect(messagesTab(page)).toHaveAccessibleName("Messages, 1 new");
  await expect(places(page).getByTestId("unread-badge")).toHaveText("1");
  const notice = page.getByRole("status").filter({ hasText: `${company} wrote back` });
  await expect(notice).toBeVisible();
  await expectNoSeriousA11yViolations(page);

  await notice.getByRole("link", { name: "Read the new message" }).click();
  await page.waitForURL(/\/portal\/messages$/);
  await expect(page.getByText(answer)).toBeVisible();
  await expect(messagesTab(page)).toHaveAccessibleName("Messages");
  await expect(places(page).getByTestId("unread-badge")).toHaveCount(0);

  // Back on Today, the notice is gone as well.
  await places(page).getByRole("link", { name: "Today" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Hello, Felix");
  await expect(page.getByText(`${company} wrote back`)).toHaveCount(0);
});

test("the header offers to call or text the company's office", async ({ page }) => {
  await page.goto("/portal/");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Hello, Felix");
  await expect(page.getByRole("banner").getByText(company)).toBeVisible();
  const call = page.getByRole("link", { name: `Call ${company}, (330) 555-0100` });
  const text = page.getByRole("link", { name: `Text ${company}, (330) 555-0100` });
  await expect(call).toHaveAttribute("href", "tel:+13305550100");
  await expect(text).toHaveAttribute("href", "sms:+13305550100");
  // Nothing sticks out sideways on a 360 px phone.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
});

test("a manager uploads a logo and the homeowner's header shows it", async ({ page, browser }) => {
  const logo = await sharp({ create: { width: 300, height: 120, channels: 4, background: { r: 31, g: 90, b: 54, alpha: 1 } } }).png().toBuffer();
  const manager = await browser.newContext();
  const managerPage = await manager.newPage();
  await signInStaff(managerPage, "dana@cobblefield.example");
  await managerPage.goto("/staff/company");
  await expect(managerPage.getByRole("heading", { level: 1, name: "Company profile" })).toBeVisible();
  await managerPage.getByLabel(/logo \(PNG, JPEG or WebP\)/i).setInputFiles({ name: "cobblefield.png", mimeType: "image/png", buffer: logo });
  await managerPage.getByRole("button", { name: "Upload logo" }).click();
  await expect(managerPage.getByText("The new logo is saved.")).toBeVisible();
  await expect(managerPage.getByRole("img", { name: `Current logo of ${company}` })).toBeVisible();
  await expectNoSeriousA11yViolations(managerPage);
  await manager.close();

  await page.goto("/portal/");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Hello, Felix");
  const shown = page.getByRole("banner").getByTestId("company-logo");
  await expect(shown).toHaveAttribute("src", /^\/api\/companies\/\d+\/logo\?v=\d+$/);
  await expect.poll(() => shown.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(300);
});
