import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

/**
 * Two-way texts end to end: a homeowner texts a photo from their phone (the SMS fake posts the
 * signed webhook with MediaUrl0, hosting the photo behind the account's Basic auth, as Twilio
 * does); a technician finds it in the question queue with the photo and answers it; the answer
 * goes back to the homeowner by text.
 *
 * Desmond: no other browser test signs him in or asks on his plan.
 */
const fakesUrl = process.env.E2E_FAKES_URL ?? "http://127.0.0.1:5191";
const homeownerPhone = "+13305550116";
const technician = "marco@cobblefield.example";

/** Each staff screen is its own download, loaded on first visit: on a busy machine that takes a while. */
const screenLoad = { timeout: 15_000 };

type RecordedSms = { direction: string; to: string; body: string; dateCreated: string };

test("a text with a photo reaches the question queue, is answered, and the answer goes back by text", async ({ page, request }) => {
  const words = `A few spots still look bare by the fence, should I reseed? ${Date.now().toString(36)}`;
  const sent = await request.post(`${fakesUrl}/__inbound`, { data: { from: homeownerPhone, body: words, samplePhoto: true } });
  expect(sent.status()).toBe(200);
  const result = (await sent.json()) as { webhookStatus: number; mediaUrls: string[]; replies: string[] };
  expect(result.webhookStatus).toBe(200);
  expect(result.mediaUrls).toHaveLength(1);
  expect(result.replies).toEqual(["Cobblefield Turf: Thanks, we got your message and photo. A technician will answer you here."]);

  await signInStaff(page, technician);
  await page.goto("/staff/questions");
  await expect(page.getByRole("heading", { level: 1, name: "Question queue" })).toBeVisible(screenLoad);
  const card = page.getByRole("listitem").filter({ hasText: words });
  await card.getByTestId("queue-question-link").click();
  await expect(page.getByRole("heading", { level: 1, name: /^Question from Desmond/ })).toBeVisible(screenLoad);
  const question = page.getByTestId("question-card").filter({ hasText: words });
  await expect(question).toBeVisible();

  // The texted photo, re-encoded by the server, opens full size.
  const photo = question.getByRole("button", { name: /Photo 1 of 1/ });
  await photo.click();
  const image = page.getByRole("dialog").getByRole("img");
  await expect(image).toBeVisible();
  await expect.poll(() => image.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(800);
  await page.keyboard.press("Escape");

  const answer = `Yes: rake the bare spots lightly, reseed and keep them damp. ${Date.now().toString(36)}`;
  await page.getByLabel("Your answer").fill(answer);
  const answeredAt = new Date().toISOString();
  await page.getByRole("button", { name: "Send answer" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Answer sent" })).toBeVisible();

  // Sending the answer by text is the notices work (not on this branch alone): the homeowner
  // should get a text after the answer, within the notice's short gathering time.
  await expect
    .poll(
      async () => {
        const list = (await (await request.get(`${fakesUrl}/__messages?to=${encodeURIComponent(homeownerPhone)}`)).json()) as { messages: RecordedSms[] };
        return list.messages.filter((m) => m.direction === "outbound-api" && m.dateCreated >= answeredAt).length;
      },
      { timeout: 20_000, message: "an SMS to the homeowner after the answer" },
    )
    .toBeGreaterThan(0);
});

test("a text from an unknown number gets one reply and waits for a manager, who marks it handled", async ({ page, request }) => {
  // A number no seeded person has, different on every run (the exchange starts with 2-9).
  const stranger = `+1330${String(200 + (Date.now() % 800))}${String(Date.now()).slice(-4)}`;
  const words = `Hi, do you do spring aeration? ${Date.now().toString(36)}`;
  const first = (await (await request.post(`${fakesUrl}/__inbound`, { data: { from: stranger, body: words } })).json()) as { replies: string[] };
  expect(first.replies).toHaveLength(1);
  expect(first.replies[0]).toMatch(/^Cobblefield Turf: Hello! This number isn't on file with Cobblefield Turf Care/);
  const second = (await (await request.post(`${fakesUrl}/__inbound`, { data: { from: stranger, body: "Hello?" } })).json()) as { replies: string[] };
  expect(second.replies).toEqual([]);

  await signInStaff(page, "dana@cobblefield.example");
  // At phone width the navigation is behind the menu button.
  await page.getByRole("button", { name: "Menu" }).click();
  await page.getByRole("link", { name: "Unmatched messages" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Unmatched messages" })).toBeVisible(screenLoad);
  const waiting = page.getByRole("region", { name: /^Waiting/ });
  const item = waiting.getByRole("listitem").filter({ hasText: words });
  await expect(item).toBeVisible();
  await expect(item.getByRole("link", { name: stranger })).toHaveAttribute("href", `sms:${stranger}`);
  await expectNoSeriousA11yViolations(page);

  await item.getByRole("button", { name: `Mark handled (message from ${stranger})` }).click();
  await expect(page.getByText(`Marked the message from ${stranger} handled.`)).toBeVisible();
  const handled = page.getByRole("region", { name: /^Handled/ }).getByRole("listitem").filter({ hasText: words });
  await expect(handled).toContainText("Handled by Dana Whitlow");
});
