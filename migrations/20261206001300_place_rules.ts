import type { Knex } from "knex";

/**
 * The rules of the places a company works in (fertilizer blackout dates, phosphorus only with a
 * reason, allowed watering days), as the company enters them from its state, county and water
 * utility rules. A property belongs to the place of its state (properties.region) whose ZIP
 * prefixes match its postal code most closely; a place with no prefixes covers the whole state.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("place_rules", (t) => {
    t.increments("id");
    t.integer("company_id").notNullable().references("companies.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("region").notNullable().comment("state or region code as properties.region holds it, e.g. OH");
    t.specificType("zip_prefixes", "text[]").notNullable().defaultTo("{}").comment("empty: the whole region");
    t.jsonb("rules").notNullable().comment("fertilizerBlackouts, phosphorus, watering: the engine's placeRules without the name");
    t.boolean("is_example").notNullable().defaultTo(false).comment("demo data: not any real place's rules");
    t.integer("updated_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["company_id", "name"]);
    t.index(["company_id", "region"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("place_rules");
}
