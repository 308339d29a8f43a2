import type { Knex } from "knex";

/** Companies, the people who sign in (staff and homeowners), and homeowners' own details. */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("CREATE EXTENSION IF NOT EXISTS citext");

  await knex.schema.createTable("companies", (t) => {
    t.increments("id");
    t.text("slug").notNullable().unique();
    t.text("name").notNullable();
    t.text("time_zone").notNullable();
    t.text("sms_sender_name").notNullable();
    t.integer("answer_target_hours").notNullable().defaultTo(24);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("users", (t) => {
    t.increments("id");
    t.integer("company_id").notNullable().references("companies.id").onDelete("CASCADE");
    t.enu("role", ["customer", "technician", "manager"], { useNative: true, enumName: "user_role" }).notNullable();
    t.text("name").notNullable();
    t.specificType("email", "citext").unique();
    t.text("phone").unique(); // E.164 (ITU-T E.164)
    t.text("google_sub").unique();
    t.boolean("active").notNullable().defaultTo(true);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("deactivated_at", { useTz: true });
  });
  await knex.raw(
    "ALTER TABLE users ADD CONSTRAINT users_contact_present CHECK (email IS NOT NULL OR phone IS NOT NULL)",
  );

  await knex.schema.createTable("customers", (t) => {
    t.increments("id");
    t.integer("company_id").notNullable().references("companies.id").onDelete("CASCADE");
    t.integer("user_id").notNullable().unique().references("users.id").onDelete("CASCADE");
    t.text("first_name").notNullable();
    t.text("last_name").notNullable();
    t.text("external_ref").comment("the company's own customer number, used to match imports");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["company_id", "external_ref"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("customers");
  await knex.schema.dropTable("users");
  await knex.raw("DROP TYPE IF EXISTS user_role");
  await knex.schema.dropTable("companies");
}
