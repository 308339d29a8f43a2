import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

/**
 * A saved reply that names a grass this lawn doesn't have is flagged when the technician puts it in
 * the answer, so "your Bermuda grass" never reaches a tall-fescue lawn unread.
 *
 * Walt Fenwick's tall-fescue lawn (seeded with tall fescue); no homeowner signs in here.
 */
test.describe.configure({ timeout: 120_000 });

test("the saved-reply picker warns about grasses the lawn doesn't have, and only then", async ({ page }) => {
  await signInStaff(page, "dana@cobblefield.example");
  const stamp = Date.now().toString(36);
  const replies = {
    other: { title: `Grasses elsewhere ${stamp}`, body: "Hi {{firstName}}, your tall fescue is up. Bermuda grass and zoysia wait for summer." },
    same: { title: `Grasses here ${stamp}`, body: "Hi {{firstName}}, your tall fescue is up." },
  };
  for (const reply of Object.values(replies)) {
    const created = await page.request.post("/api/saved-replies", { data: reply });
    expect(created.status()).toBe(201);
  }
  const { customers } = (await (await page.request.get("/api/customers?q=Fenwick")).json()) as { customers: { id: number }[] };
  const { plans } = (await (await page.request.get(`/api/customers/${customers[0]!.id}`)).json()) as { plans: { id: number }[] };

  await page.goto(`/staff/questions/${plans[0]!.id}`);
  const picker = page.getByLabel("Saved reply");
  await expect(picker).toBeVisible({ timeout: 30_000 });
  await picker.selectOption({ label: replies.other.title });
  await page.getByRole("button", { name: "Use this reply" }).click();
  await expect(page.getByLabel("Your answer")).toHaveValue(/^Hi Walt, your tall fescue is up\./);
  await expect(page.getByTestId("saved-reply-other-grasses")).toHaveText(
    "This reply mentions bermudagrass and zoysiagrass, not in this lawn or its seed mix. Change it before sending.",
  );
  await expectNoSeriousA11yViolations(page);

  // A reply is added below what is already typed; start from an empty answer for the second one.
  await page.getByLabel("Your answer").fill("");
  await picker.selectOption({ label: replies.same.title });
  await page.getByRole("button", { name: "Use this reply" }).click();
  await expect(page.getByLabel("Your answer")).toHaveValue(/^Hi Walt, your tall fescue is up\.$/);
  await expect(page.getByTestId("saved-reply-other-grasses")).toHaveCount(0);
});
