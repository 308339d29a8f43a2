import type { Knex } from "knex";
import { demoCompany } from "./data/demo-company.ts";

/**
 * One example place for the demo company, marked as an example: invented dates and days that
 * show what the rules do, not any state's or county's law. Its ZIP prefix matches none of the
 * demo lawns, so the demo's plans stay as they were; a manager points it at real lawns, with
 * their own local rules, on the Places page. Upserts on the place's name.
 */
export const examplePlace = {
  name: "Example place (not a real ordinance)",
  region: "OH",
  zip_prefixes: ["44999"],
  rules: {
    fertilizerBlackouts: [{ from: "12-01", to: "02-28" }],
    phosphorus: "needs_reason",
    watering: { allowedWeekdays: [1, 3, 6], newLawnExemptDays: 30 },
  },
  is_example: true,
};

export async function seed(knex: Knex): Promise<void> {
  const company = await knex("companies").where({ slug: demoCompany.slug }).first<{ id: number }>("id");
  await knex("place_rules")
    .insert({ company_id: company.id, ...examplePlace, rules: JSON.stringify(examplePlace.rules) })
    .onConflict(["company_id", "name"])
    .merge(["region", "zip_prefixes", "rules", "is_example"]);
}
