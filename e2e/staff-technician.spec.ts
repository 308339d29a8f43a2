import { expect, test, type Browser, type BrowserContext, type Page } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInHomeownerThroughOutbox, signInStaff } from "./support.ts";

/**
 * The technician's side of the staff app at phone width: the question queue, answering a
 * photo question (and the homeowner reading the answer), booking a follow-up visit from a
 * question, logging a visit, and the customer pages.
 *
 * Imogen rather than Ruth: the portal journey signs Ruth in, and sign-in links are limited
 * per contact, so the two files don't spend each other's allowance.
 */
const homeowner = "imogen.c@mail.example";
const technician = "marco@cobblefield.example";

/** A 24×16 green JPEG; the server re-encodes it. */
const tinyJpeg =
  "/9j/2wBDAA0JCgsKCA0LCgsODg0PEyAVExISEyccHhcgLikxMC4pLSwzOko+MzZGNywtQFdBRkxOUlNSMj5aYVpQYEpRUk//2wBDAQ4ODhMREyYVFSZPNS01T09PT09PT09PT09PT09PT09PT09PT09PT09PT09PT09PT09PT09PT09PT09PT09PT0//wAARCAAQABgDASIAAhEBAxEB/8QAFQABAQAAAAAAAAAAAAAAAAAAAAT/xAAUEAEAAAAAAAAAAAAAAAAAAAAA/8QAFgEBAQEAAAAAAAAAAAAAAAAAAAQF/8QAFBEBAAAAAAAAAAAAAAAAAAAAAP/aAAwDAQACEQMRAD8AlAZyIAB//9k=";

type SignedIn = Awaited<ReturnType<BrowserContext["storageState"]>>;
let homeownerState: SignedIn;
let staffState: SignedIn;

test.beforeAll(async ({ browser }) => {
  const home = await browser.newContext();
  await signInHomeownerThroughOutbox(browser, await home.newPage(), homeowner);
  homeownerState = await home.storageState();
  await home.close();

  const staff = await browser.newContext();
  await signInStaff(await staff.newPage(), technician);
  staffState = await staff.storageState();
  await staff.close();
});

test.beforeEach(async ({ context }) => {
  await context.addCookies(staffState.cookies);
});

/** Words no earlier run used, so the row and the answer are found for sure. */
const unique = (words: string) => `${words} ${Date.now().toString(36)}`;

/** The homeowner asks through the API from a portal page, as the Ask screen does (multipart with a photo). */
async function askWithPhoto(browser: Browser, text: string): Promise<number> {
  const context = await browser.newContext({ storageState: homeownerState });
  const page = await context.newPage();
  await page.goto("/portal/");
  const planId = await page.evaluate(
    async ({ text, jpeg }) => {
      const { plans } = (await (await fetch("/api/my/plans")).json()) as { plans: { id: number }[] };
      const form = new FormData();
      form.append("text", text);
      const bytes = Uint8Array.from(atob(jpeg), (c) => c.charCodeAt(0));
      form.append("photos", new Blob([bytes], { type: "image/jpeg" }), "lawn.jpg");
      const response = await fetch(`/api/plans/${plans[0]!.id}/questions`, { method: "POST", body: form, headers: { Accept: "application/json" } });
      if (response.status !== 201) throw new Error(`asking failed: ${response.status} ${await response.text()}`);
      return plans[0]!.id;
    },
    { text, jpeg: tinyJpeg },
  );
  await context.close();
  return planId;
}

/** From the queue (cards at phone width) into the question with these words. */
async function openFromQueue(page: Page, text: string) {
  await page.goto("/staff/questions");
  await expect(page.getByRole("heading", { level: 1, name: "Question queue" })).toBeVisible();
  const card = page.getByRole("listitem").filter({ hasText: text });
  await card.getByTestId("queue-question-link").click();
  await expect(page.getByRole("heading", { level: 1, name: /^Question from Imogen/ })).toBeVisible();
  await expect(page.getByTestId("question-card").filter({ hasText: text })).toBeVisible();
}

test("a technician answers a photo question and the homeowner sees the answer", async ({ page, browser }) => {
  const question = unique("Brown patch by the shed");
  await askWithPhoto(browser, question);

  await openFromQueue(page, question);
  await expect(page.getByTestId("plan-day-summary")).toHaveText(/(day \d+ of the \w+ phase|before the visit|after the visit|plan ended)/i);

  // The photo opens full size in a dialog that Escape closes.
  const photo = page.getByTestId("question-card").getByRole("button", { name: /Photo 1 of 1/ });
  await photo.click();
  const dialog = page.getByRole("dialog");
  await expect(dialog.getByRole("img")).toBeVisible();
  await page.keyboard.press("Escape");
  await expect(dialog).toBeHidden();
  await expect(photo).toBeFocused();

  const answer = unique("Rake the patch lightly and reseed; keep it moist.");
  await page.getByLabel("Your answer").fill(answer);
  await expect(page.getByLabel("Mark the question answered")).toBeChecked();
  await page.getByRole("button", { name: "Send answer" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Answer sent" })).toBeVisible();

  // Marked answered: it has left the queue.
  await page.goto("/staff/questions");
  await expect(page.getByRole("heading", { level: 1, name: "Question queue" })).toBeVisible();
  await expect(page.getByText(/open questions?|No open questions/).first()).toBeVisible();
  await expect(page.getByRole("listitem").filter({ hasText: question })).toHaveCount(0);

  const home = await browser.newContext({ storageState: homeownerState });
  const homePage = await home.newPage();
  await homePage.goto("/portal/messages");
  await expect(homePage.getByText(answer)).toBeVisible();
  await home.close();
});

test("a technician books a follow-up visit from a question and records why", async ({ page, browser }) => {
  const question = unique("Nothing came up along the path");
  await askWithPhoto(browser, question);
  await openFromQueue(page, question);

  await page.getByRole("button", { name: "Book a follow-up visit" }).click();
  const dialog = page.getByRole("dialog", { name: "Book a follow-up visit" });
  // Nothing picked yet: the reason is required and said so in place.
  await dialog.getByRole("button", { name: "Book follow-up visit" }).click();
  await expect(dialog.getByText("Pick a reason from the list")).toBeVisible();

  const why = unique("Seed washed off the slope after Tuesday's storm");
  await dialog.getByLabel("Why is a visit needed?").selectOption({ label: "Washed out by rain" });
  await dialog.getByLabel("What you saw (optional)").fill(why);
  const tomorrow = new Date(Date.now() + 86_400_000).toLocaleDateString("en-CA");
  await dialog.getByLabel("Date (optional)").fill(tomorrow);
  await dialog.getByLabel("Technician").selectOption({ label: "Me (Marco Ibsen)" });
  await dialog.getByRole("button", { name: "Book follow-up visit" }).click();

  await expect(dialog).toBeHidden();
  const booked = page.getByRole("status").filter({ hasText: "Follow-up visit booked" });
  await expect(booked).toContainText("Washed out by rain");
  await expect(booked).toContainText("Marco Ibsen");
  await expect(booked).toContainText("scheduled");

  // The reason and the note are on record, tied to the question.
  const recorded = await page.evaluate(async (note) => {
    const { rows } = (await (await fetch("/api/follow-ups?reason=washed_out&limit=200")).json()) as { rows: { reasonNote: string | null; questionMessageId: number | null }[] };
    return rows.find((row) => row.reasonNote === note) ?? null;
  }, why);
  expect(recorded?.questionMessageId).toBeGreaterThan(0);
});

test("a technician logs a seeding visit with live amounts and lands on the new care plan", async ({ page }) => {
  await page.goto("/staff/visits/new");
  await expect(page.getByRole("heading", { level: 1, name: "Log a visit" })).toBeVisible();
  const startOver = page.getByRole("button", { name: "Start a new visit" });
  if (await startOver.isVisible()) await startOver.click();

  // Saving an empty form: messages in place and a summary, nothing sent.
  await page.getByRole("button", { name: "Save visit" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "before saving" })).toContainText("Customer's lawn: Pick the customer's lawn");

  await page.getByLabel("Customer").fill("Castellanos");
  await page.getByRole("button", { name: /Imogen Castellanos/ }).click();
  await expect(page.getByTestId("chosen-lawn")).toContainText("7 Sorrel Court");
  await expect(page.getByLabel("Area treated (ft²)")).toHaveValue("4200");

  await page.getByLabel("Overseeding").check();
  await page.getByRole("button", { name: "Add a seed line" }).click();
  await page.getByLabel("Species").selectOption({ label: "Tall fescue" });
  await page.getByLabel("Share of mix %").fill("100");
  await page.getByLabel("Purity %").fill("98");
  await page.getByLabel("Germination %").fill("90");
  await expect(page.getByText("Pure live seed: 88.2 %")).toBeVisible();
  await page.getByLabel("Seed rate (lb of bulk seed per 1,000 ft²)").fill("5");
  // 5 lb × 4,200 ft² / 1,000 = 21 lb: one 50 lb bag.
  await expect(page.getByTestId("seed-totals")).toContainText("21 lb of seed — 1 bag");

  await page.getByRole("button", { name: "Add a product" }).click();
  await page.getByLabel("Name on the bag").fill("Starter 18-24-12");
  await page.getByLabel("N %", { exact: true }).fill("18");
  await page.getByLabel("P %", { exact: true }).fill("24");
  await page.getByLabel("K %", { exact: true }).fill("12");
  await page.getByLabel("Rate (lb per 1,000 ft²)").fill("4");
  // 4 lb × 4.2 = 16.8 lb; 18 % of 4 lb = 0.72 lb N per 1,000 ft².
  await expect(page.getByTestId("product-figures")).toContainText("16.8 lb — 1 bag; 0.72 lb N per 1,000 ft²");

  await page.getByRole("button", { name: "Save visit" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Visit saved" })).toBeVisible();
  await page.getByTestId("saved-plan-link").click();
  await expect(page.getByRole("heading", { level: 1, name: "Imogen Castellanos" })).toBeVisible();
  await expect(page.locator("article[id^='plan-']:focus")).toContainText("7 Sorrel Court");
});

test("the technician screens have no serious accessibility problems", async ({ page, browser }) => {
  const question = unique("Is the yellow normal");
  const planId = await askWithPhoto(browser, question);

  await page.goto("/staff/questions");
  await expect(page.getByRole("listitem").filter({ hasText: question })).toBeVisible();
  await expectNoSeriousA11yViolations(page);

  await page.goto(`/staff/questions/${planId}`);
  await expect(page.getByTestId("plan-day-summary")).toBeVisible();
  await expectNoSeriousA11yViolations(page);
  await page.getByRole("button", { name: "Book a follow-up visit" }).click();
  await expect(page.getByRole("dialog", { name: "Book a follow-up visit" })).toBeVisible();
  await expectNoSeriousA11yViolations(page);
  await page.keyboard.press("Escape");

  await page.goto("/staff/visits/new");
  await page.getByRole("button", { name: "Add a seed line" }).click();
  await page.getByRole("button", { name: "Add a product" }).click();
  await page.getByLabel("A regulated product was applied on this visit").check();
  await page.getByRole("button", { name: "Save visit" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "before saving" })).toBeVisible();
  await expectNoSeriousA11yViolations(page);

  await page.goto("/staff/customers?q=Castellanos");
  await expect(page.getByRole("link", { name: "Imogen Castellanos" })).toBeVisible();
  await expectNoSeriousA11yViolations(page);
  await page.getByRole("link", { name: "Imogen Castellanos" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Imogen Castellanos" })).toBeVisible();
  await expectNoSeriousA11yViolations(page);
});
