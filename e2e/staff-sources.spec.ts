import { expect, test } from "@playwright/test";
import { expectNoSeriousA11yViolations, signInStaff } from "./support.ts";

/**
 * The staff "Sources to check" page at phone width: every care-plan value still marked
 * "from memory", read from the engine's own tables. A technician can open it.
 */
test("a technician finds the values still recalled from memory, each with its recalled source", async ({ page }) => {
  await signInStaff(page, "marco@cobblefield.example");
  await page.getByRole("button", { name: "Menu" }).click();
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Sources to check" }).click();

  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Sources to check");
  const species = page.getByRole("region", { name: /Grass species/ });
  // Emergence days are recalled from land-grant establishment guides (tables/species.ts, "from memory").
  const bluegrass = species.getByRole("listitem").filter({ hasText: "Kentucky bluegrass: days from sowing to first sprouts" });
  await expect(bluegrass).toContainText("14–30");
  await expect(bluegrass).toContainText("US land-grant extension establishment guides");
  // Published values are not listed: tall fescue's new-lawn rate is Cornell's and Nebraska's.
  await expect(page.getByText("Tall fescue: new-lawn seed rate")).toHaveCount(0);
  // Sprinkler rates are recalled from the IFAS and Texas A&M irrigation guides (tables/sprinklers.ts).
  await expect(page.getByRole("region", { name: /Sprinklers/ }).getByRole("listitem").filter({ hasText: "Rotor heads" })).toContainText("0.4–0.8");
  await expectNoSeriousA11yViolations(page);
});
