import type { Knex } from "knex";

/**
 * Follow-up visits and callbacks, the manager's saved replies, who invited each staff
 * member, and the bookkeeping of CSV visit imports.
 *
 * Staff invitations reuse the users table (an invited person is an active staff row that
 * has not signed in with Google yet) instead of a separate invitations table: Google
 * sign-in already finds staff by e-mail address, so an invitation needs no token or
 * acceptance step of its own. users.invited_by / invited_at record who asked for it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("companies", (t) => {
    // Invented default; managers set their own. Prices callback labour in the callback report.
    t.decimal("labour_rate_per_hour", 8, 2).notNullable().defaultTo(55);
  });

  await knex.schema.alterTable("users", (t) => {
    t.integer("invited_by").references("users.id").onDelete("SET NULL");
    t.timestamp("invited_at", { useTz: true });
  });

  await knex.schema.createTable("follow_up_visits", (t) => {
    t.increments("id");
    t.integer("property_id").notNullable().references("properties.id").onDelete("CASCADE");
    t.integer("plan_id").references("care_plans.id").onDelete("SET NULL");
    // The question that led to this visit. No foreign key yet: the messages table belongs to
    // the questions feature, which is being written at the same time; add the key
    // (references messages.id, on delete set null) once both have landed.
    t.bigInteger("question_message_id");
    t.enu("status", ["requested", "scheduled", "done", "closed"], { useNative: true, enumName: "follow_up_status" }).notNullable().defaultTo("requested");
    t.date("scheduled_for").comment("local date at the property");
    t.integer("technician_id").references("users.id").onDelete("SET NULL");
    t.enu(
      "reason",
      ["no_germination", "washed_out", "mowed_too_early", "herbicide_applied", "poor_seed_soil_contact", "under_watering", "over_watering", "disease", "pest_damage", "other"],
      { useNative: true, enumName: "follow_up_reason" },
    ).notNullable();
    t.text("reason_note");
    t.boolean("is_callback").notNullable().defaultTo(false).comment("a free return visit because the result failed");
    t.decimal("labour_hours", 6, 2);
    t.decimal("materials_cost", 10, 2);
    t.enu("outcome", ["resolved", "partly_resolved", "not_resolved", "pending"], { useNative: true, enumName: "follow_up_outcome" }).notNullable().defaultTo("pending");
    t.text("outcome_note");
    t.integer("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["property_id"]);
    t.index(["plan_id"]);
    t.index(["status", "scheduled_for"]);
    t.index(["technician_id"]);
  });
  await knex.raw("ALTER TABLE follow_up_visits ADD CONSTRAINT follow_up_costs_not_negative CHECK (coalesce(labour_hours, 0) >= 0 AND coalesce(materials_cost, 0) >= 0)");

  await knex.schema.createTable("saved_replies", (t) => {
    t.increments("id");
    t.integer("company_id").notNullable().references("companies.id").onDelete("CASCADE");
    t.text("title").notNullable();
    t.text("body").notNullable().comment("may hold {{firstName}}, {{visitDate}}, {{firstMowDate}}, {{companyName}}");
    t.integer("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["company_id", "title"]);
  });

  await knex.schema.createTable("import_batches", (t) => {
    t.increments("id");
    t.integer("company_id").notNullable().references("companies.id").onDelete("CASCADE");
    t.text("file_sha256").notNullable();
    t.enu("status", ["previewed", "running", "done", "failed"], { useNative: true, enumName: "import_batch_status" }).notNullable().defaultTo("previewed");
    t.integer("row_count").notNullable().defaultTo(0);
    t.integer("processed_count").notNullable().defaultTo(0).comment("rows of the current or last run handled so far, for the progress bar");
    t.integer("created_count").notNullable().defaultTo(0).comment("visits this file has created, over all its runs");
    t.integer("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("finished_at", { useTz: true });
    // The same file uploaded twice is one batch: its status is the status of that file.
    t.unique(["company_id", "file_sha256"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("import_batches");
  await knex.raw("DROP TYPE IF EXISTS import_batch_status");
  await knex.schema.dropTable("saved_replies");
  await knex.schema.dropTable("follow_up_visits");
  await knex.raw("DROP TYPE IF EXISTS follow_up_outcome");
  await knex.raw("DROP TYPE IF EXISTS follow_up_reason");
  await knex.raw("DROP TYPE IF EXISTS follow_up_status");
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("invited_at");
    t.dropColumn("invited_by");
  });
  await knex.schema.alterTable("companies", (t) => {
    t.dropColumn("labour_rate_per_hour");
  });
}
