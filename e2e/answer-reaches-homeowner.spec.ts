import { expect, test, type Page } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInHomeownerThroughOutbox, signInStaff } from "./support.ts";

/**
 * Issue 11's first loop, end to end: the homeowner asks in the portal, a technician answers in the
 * staff app, the answer notice reaches the homeowner's phone (the fakes' outbox), and its link,
 * opened signed out on another device, goes through sign-in and lands on the conversation with
 * the answer marked new.
 *
 * Desmond rather than anyone else: no other browser test signs him in, so sign-in link limits and
 * his conversation are this file's own.
 */
const homeowner = { email: "des.achterberg@mail.example", phone: "+13305550116", firstName: "Desmond" };
const technician = "marco@cobblefield.example";
const fakesUrl = process.env.E2E_FAKES_URL ?? "http://127.0.0.1:5191";

// The machine running browser tests may be busy: screens that load code get longer than the default 5 s.
const patient = { timeout: 30_000 };

type OutboxEntry = { to: string; text: string; links: string[]; receivedAt: string };
async function outbox(page: Page): Promise<OutboxEntry[]> {
  return (await (await page.request.get(`${fakesUrl}/__outbox`)).json()).messages as OutboxEntry[];
}

/** The newest message to `to` with a link matching `pattern` (the outbox lists newest first). */
async function linkFromOutbox(page: Page, to: string, pattern: RegExp): Promise<{ link: string; text: string }> {
  let found: { link: string; text: string } | undefined;
  await expect(async () => {
    const message = (await outbox(page)).find((m) => m.to === to && m.links.some((l) => pattern.test(l)));
    found = message && { link: message.links.find((l) => pattern.test(l))!, text: message.text };
    expect(found).toBeDefined();
  }).toPass({ timeout: 20_000 });
  return found!;
}

test("an answer reaches the homeowner, whose link survives sign-in and opens the conversation with the answer marked new", async ({ browser }) => {
  const stamp = Date.now().toString(36);
  const question = `Some seed washed into the low corner after the storm, should I rake it back? ${stamp}`;
  const answer = `Leave it there and add a little seed where it thinned out; keep it damp. ${stamp}`;

  // The homeowner asks from the Ask screen.
  const home = await browser.newContext();
  const homePage = await home.newPage();
  await signInHomeownerThroughOutbox(browser, homePage, homeowner.email);
  await homePage.goto("/portal/ask");
  await expect(homePage.getByLabel("Your question")).toBeVisible(patient);
  await homePage.getByLabel("Your question").fill(question);
  await homePage.getByRole("button", { name: "Send question" }).click();
  await homePage.waitForURL(/\/portal\/messages$/);
  await expect(homePage.getByRole("article").filter({ hasText: question })).toBeVisible(patient);
  await home.close();

  // A technician answers from the queue.
  const staff = await browser.newContext();
  const staffPage = await staff.newPage();
  await signInStaff(staffPage, technician);
  await staffPage.goto("/staff/questions");
  await staffPage.getByRole("listitem").filter({ hasText: question }).getByTestId("queue-question-link").click();
  await expect(staffPage.getByRole("heading", { level: 1, name: new RegExp(`^Question from ${homeowner.firstName}`) })).toBeVisible(patient);
  await staffPage.getByLabel("Your answer").fill(answer);
  await staffPage.getByRole("button", { name: "Send answer" }).click();
  await expect(staffPage.getByRole("status").filter({ hasText: "Answer sent" })).toBeVisible(patient);

  // The notice goes to the homeowner's chosen channel (a text, by default) once the gathering delay is over.
  const notice = await linkFromOutbox(staffPage, homeowner.phone, /\/portal\/messages\?plan=\d+$/);
  expect(notice.text).toMatch(/^Cobblefield/);
  expect(notice.text).toContain("Marco");
  expect(notice.text).toContain("Leave it there and add a little seed");
  await staff.close();

  // Opened on a phone that is not signed in: sign-in, keeping where the link was going.
  const phone = await browser.newContext({ viewport: { width: 360, height: 780 }, isMobile: true, hasTouch: true });
  const phonePage = await phone.newPage();
  await phonePage.goto(notice.link);
  await phonePage.waitForURL(/\/portal\/sign-in\?next=/);
  expect(new URL(phonePage.url()).searchParams.get("next")).toBe(new URL(notice.link).pathname + new URL(notice.link).search);
  await expect(phonePage.getByLabel("E-mail address or mobile number")).toBeVisible(patient);
  await phonePage.getByLabel("E-mail address or mobile number").fill(homeowner.email);
  await phonePage.getByRole("button", { name: "Send me a sign-in link" }).click();
  await expect(phonePage.getByRole("heading", { name: /check your messages/i })).toBeVisible(patient);

  const signIn = await linkFromOutbox(phonePage, homeowner.email, /\/portal\/sign-in\/verify\?.*next=/);
  await phonePage.goto(signIn.link);
  await phonePage.waitForURL((url) => url.pathname === "/portal/messages" && url.search === new URL(notice.link).search);
  const answered = phonePage.getByRole("article").filter({ hasText: answer });
  await expect(answered).toBeVisible(patient);
  await expect(answered.getByText("New", { exact: true })).toBeVisible();
  await expectNoSeriousA11yViolations(phonePage);
  await phone.close();
});
