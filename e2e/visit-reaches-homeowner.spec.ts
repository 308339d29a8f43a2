import { expect as baseExpect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInHomeownerThroughOutbox, signInStaff } from "./support.ts";

/** Each screen loads its code and data on first visit; on a shared test machine that can pass five seconds. */
const expect = baseExpect.configure({ timeout: 15_000 });

/**
 * A follow-up visit reaches the homeowner: a manager books it for a technician from the follow-ups page with an
 * arrival window and what to do before; the homeowner sees it on Today and in their calendar feed,
 * asks for another day, and the request lands in the technicians' question queue.
 *
 * Desmond, whom no other browser test signs in, so sign-in link limits are his alone.
 */
const homeowner = "des.achterberg@mail.example";
const manager = "dana@cobblefield.example";

/** A date a few days ahead, as the date input takes it (the browser and the lawn share a zone here). */
function daysAhead(days: number): string {
  const d = new Date(Date.now() + days * 86_400_000);
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, "0")}-${String(d.getDate()).padStart(2, "0")}`;
}

test("a booked visit reaches the homeowner, who asks for another day, and staff see the request", async ({ browser }) => {
  // Three people's screens in one journey: longer than one screen's test.
  test.setTimeout(180_000);
  const visitDate = daysAhead(4);
  const prep = "Don't mow for two days before the visit";

  // The manager adds the visit from the follow-ups page, not from a question, for Marco.
  const staffContext = await browser.newContext();
  const staff = await staffContext.newPage();
  await signInStaff(staff, manager);
  await staff.goto("/staff/follow-ups");
  await staff.getByRole("button", { name: "Add follow-up" }).click();
  const dialog = staff.getByRole("dialog", { name: "Add a follow-up visit" });
  await dialog.getByLabel("Customer").fill("Achterberg");
  await dialog.getByRole("button", { name: /Desmond Achterberg/ }).click();
  await expect(dialog.getByText("402 Old Ferry Road")).toBeVisible();
  await dialog.getByLabel("Why is a visit needed?").selectOption("no_germination");
  await dialog.getByLabel("Date (optional)").fill(visitDate);
  await dialog.getByLabel("Technician").selectOption({ label: "Marco Ibsen" });
  await dialog.getByLabel("Arriving from").fill("09:00");
  await dialog.getByLabel("Arriving by").fill("11:00");
  await dialog.getByRole("button", { name: prep }).click();
  await expect(dialog.getByLabel("Before the visit, please… (optional)")).toHaveValue(prep);
  await expectNoSeriousA11yViolations(staff);
  await dialog.getByRole("button", { name: "Add follow-up visit" }).click();
  await expect(staff.getByRole("status").filter({ hasText: "Follow-up visit added" })).toContainText("booked; the homeowner is told");

  // The homeowner sees it on Today: date, window, who is coming, why, what to do before.
  const homeContext = await browser.newContext();
  const home = await homeContext.newPage();
  await signInHomeownerThroughOutbox(browser, home, homeowner);
  const visit = home.getByRole("article", { name: "Your next visit" });
  await expect(visit).toBeVisible();
  await expect(visit).toContainText("Arriving between 9 am and 11 am");
  await expect(visit).toContainText(/Marco from .+ is coming/);
  await expect(visit).toContainText("the new grass hasn't come up");
  await expect(visit).toContainText(prep);
  await expectNoSeriousA11yViolations(home);

  // It is in the homeowner's calendar feed, as an event over the arrival window.
  const feed = await home.evaluate(async () => {
    const { url } = (await (await fetch("/api/my/calendar")).json()) as { url: string };
    return (await fetch(new URL(url).pathname)).text();
  });
  const compact = visitDate.replaceAll("-", "");
  expect(feed).toMatch(/UID:follow-up\.\d+@sproutline/);
  expect(feed).toContain(`DTSTART;TZID=America/New_York:${compact}T090000`);
  expect(feed).toContain(`DTEND;TZID=America/New_York:${compact}T110000`);

  // The homeowner asks for another day, with the days that suit them.
  await visit.getByRole("button", { name: "Ask for another day" }).click();
  const form = home.getByRole("form", { name: "Ask for another day" });
  await form.getByLabel("Monday").check();
  await form.getByLabel("Friday").check();
  const note = `Away that morning ${Date.now().toString(36)}`;
  await form.getByLabel("Anything else? (optional)").fill(note);
  await form.getByRole("button", { name: "Send request" }).click();
  await expect(visit).toContainText("You asked for another day");

  // The whole plan has the visit on its day, and in its Visits section with the answer given.
  await home.goto("/portal/plan");
  // The whole plan is hundreds of steps: on a busy machine it takes a while to lay out.
  await expect(home.getByRole("region", { name: "Visits" })).toContainText("You asked for another day", { timeout: 20_000 });
  await expect(home.getByText(/^Visit from /).first()).toBeVisible({ timeout: 20_000 });

  // Staff see the request in the question queue.
  await staff.goto("/staff/questions");
  await expect(staff.getByRole("heading", { level: 1, name: "Question queue" })).toBeVisible();
  // The queue shows the start of the request; the question page shows all of it.
  const request = staff.getByRole("listitem").filter({ hasText: "Could we move the visit" }).filter({ hasText: "Desmond" });
  await expect(request).toBeVisible();
  await request.getByTestId("queue-question-link").click();
  const question = staff.getByTestId("question-card").filter({ hasText: note });
  await expect(question).toContainText("Could we move the visit");
  await expect(question).toContainText("Days that suit me: Monday, Friday.");

  await homeContext.close();
  await staffContext.close();
});
