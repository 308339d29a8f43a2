import type { Knex } from "knex";

/** A customer's lawns and the service visits done on them. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("properties", (t) => {
    t.increments("id");
    t.integer("customer_id").notNullable().references("customers.id").onDelete("CASCADE");
    t.text("label").notNullable().defaultTo("Home");
    t.text("street").notNullable();
    t.text("town").notNullable();
    t.text("region").notNullable();
    t.text("postal_code").notNullable();
    t.text("time_zone").notNullable(); // IANA zone: plan dates are local to the lawn
    t.integer("lawn_area_ft2");
    t.jsonb("lawn").notNullable().defaultTo("{}").comment("grass, irrigation, mowing and frost facts the care-plan engine reads");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["customer_id", "label"]);
  });

  await knex.schema.createTable("service_visits", (t) => {
    t.increments("id");
    t.integer("property_id").notNullable().references("properties.id").onDelete("CASCADE");
    t.integer("technician_id").references("users.id").onDelete("SET NULL");
    t.date("visit_date").notNullable();
    t.specificType("services", "text[]").notNullable();
    t.jsonb("details").notNullable().defaultTo("{}").comment("seed mix, seed rate, area, products and rates as logged");
    t.text("notes");
    t.text("import_key").comment("stable key of an imported row, so re-importing creates nothing twice");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["property_id", "visit_date"]);
    t.index(["technician_id", "visit_date"]);
    t.unique(["import_key"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("service_visits");
  await knex.schema.dropTable("properties");
}
