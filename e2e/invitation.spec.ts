import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

/**
 * Journey 1 of the brief: a visit is logged, the homeowner gets a welcome message with a one-tap
 * sign-in link, follows it, and sees today's steps. The link is read from the fakes' outbox, as a
 * demo would. The welcome waits out the (shortened) gathering delay and goes by the homeowner's
 * default channel: a text, since Hana has a mobile number.
 */
test("a logged seeding visit invites the homeowner, whose link opens today's steps", async ({ browser, page }) => {
  const fakesUrl = process.env.E2E_FAKES_URL ?? "http://127.0.0.1:5191";
  const homeowner = { email: "hana.sorbye@mail.example", phone: "+13305550117" }; // seeded without a visit of her own

  await signInStaff(page, "priya@cobblefield.example");
  const search = await page.request.get("/api/customers?q=Hana");
  const propertyId = (await search.json()).customers[0].properties[0].id as number;
  const today = new Intl.DateTimeFormat("en-CA", { timeZone: "America/New_York" }).format(new Date());
  const logged = await page.request.post("/api/visits", {
    data: {
      propertyId,
      visit: {
        date: today,
        services: ["aeration", "overseeding"],
        seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }],
        seedRateLbPer1000: 5,
        areaFt2: 3600,
        products: [],
      },
    },
  });
  expect(logged.status()).toBe(201);
  expect(await logged.json()).toMatchObject({ invitationSent: true, welcomeChannels: ["sms"] });

  let link: string | undefined;
  await expect(async () => {
    const outbox = (await (await page.request.get(`${fakesUrl}/__outbox`)).json()).messages as { to: string; text: string; links: string[] }[];
    link = outbox.find((m) => m.to === homeowner.phone && m.text.includes("plan is ready"))?.links.find((l) => l.includes("/portal/sign-in/verify"));
    expect(link).toBeDefined();
  }).toPass({ timeout: 15_000 });

  const home = await browser.newContext({ viewport: { width: 360, height: 780 }, isMobile: true, hasTouch: true });
  const phone = await home.newPage();
  await phone.goto(link!);
  await phone.waitForURL(/\/portal\/?$/);
  await expect(phone.getByRole("heading", { level: 1 })).toHaveText("Hello, Hana");
  // Visit day: light watering starts today.
  await expect(phone.getByText(/water/i).first()).toBeVisible();
  await expectNoSeriousA11yViolations(phone);
  await home.close();
});
