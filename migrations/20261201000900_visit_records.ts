import type { Knex } from "knex";

/**
 * The day's conditions and the regulated-application record of a visit, as structured data
 * (they used to travel inside `notes`). Shapes are checked by `shared/schemas/visits.ts`.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("service_visits", (t) => {
    t.jsonb("conditions").nullable().comment("{ temperatureF?, windMph?, windDirection? } at the time of the visit");
    t.jsonb("application_record").nullable().comment(
      "a regulated product's application record: product, registration numbers, rate, area, target, applicator and licence, wind, temperature",
    );
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("service_visits", (t) => {
    t.dropColumn("application_record");
    t.dropColumn("conditions");
  });
}
