import type { Knex } from "knex";

/** Versioned care-program settings, and the care plans the engine makes from visits. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("program_settings", (t) => {
    t.increments("id");
    t.integer("company_id").notNullable().references("companies.id").onDelete("CASCADE");
    t.integer("version").notNullable();
    t.jsonb("settings").notNullable();
    t.integer("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["company_id", "version"]);
  });

  await knex.schema.createTable("care_plans", (t) => {
    t.increments("id");
    t.integer("property_id").notNullable().references("properties.id").onDelete("CASCADE");
    t.integer("visit_id").notNullable().unique().references("service_visits.id").onDelete("CASCADE");
    t.integer("program_version").notNullable();
    t.enu("status", ["active", "cancelled"], { useNative: true, enumName: "care_plan_status" }).notNullable().defaultTo("active");
    t.jsonb("input").notNullable().comment("the engine input snapshot the plan was made from");
    t.jsonb("observations").notNullable().defaultTo("[]");
    t.jsonb("hold_offs").notNullable().defaultTo("[]");
    t.jsonb("warnings").notNullable().defaultTo("[]");
    t.jsonb("figures").notNullable().defaultTo("{}");
    t.timestamp("generated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["property_id"]);
  });

  await knex.schema.createTable("plan_steps", (t) => {
    t.bigIncrements("id");
    t.integer("plan_id").notNullable().references("care_plans.id").onDelete("CASCADE");
    t.text("key").notNullable().comment("stable across regeneration, so completed steps are matched");
    t.date("date").notNullable().comment("local date in the property's time zone");
    t.text("phase").notNullable();
    t.text("kind").notNullable();
    t.text("title").notNullable();
    t.jsonb("content").notNullable().comment("detail, watering times, why and source, cautions");
    t.enu("state", ["pending", "done", "skipped"], { useNative: true, enumName: "plan_step_state" }).notNullable().defaultTo("pending");
    t.timestamp("state_changed_at", { useTz: true });
    t.integer("state_changed_by").references("users.id").onDelete("SET NULL");
    t.text("skip_reason");
    t.unique(["plan_id", "key"]);
    t.index(["plan_id", "date"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("plan_steps");
  await knex.raw("DROP TYPE IF EXISTS plan_step_state");
  await knex.schema.dropTable("care_plans");
  await knex.raw("DROP TYPE IF EXISTS care_plan_status");
  await knex.schema.dropTable("program_settings");
}
