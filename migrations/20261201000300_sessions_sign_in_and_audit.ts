import type { Knex } from "knex";

/** Sessions (connect-pg-simple's table), one-time sign-in links, and the audit log. */
export async function up(knex: Knex): Promise<void> {
  // Column names and types are the ones connect-pg-simple expects.
  await knex.schema.createTable("sessions", (t) => {
    t.string("sid").primary();
    t.json("sess").notNullable();
    t.timestamp("expire", { precision: 6, useTz: false }).notNullable();
    t.index(["expire"], "sessions_expire_idx");
  });
  // Lets sign-out-everywhere and deactivation find a user's sessions without a scan.
  await knex.raw("CREATE INDEX sessions_user_idx ON sessions (((sess -> 'passport' ->> 'user')))");

  await knex.schema.createTable("sign_in_tokens", (t) => {
    t.increments("id");
    t.integer("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("token_hash").notNullable().unique(); // SHA-256 of the token; the token itself is never stored
    t.enu("channel", ["email", "sms"], { useNative: true, enumName: "sign_in_channel" }).notNullable();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // Every sign-in link request, known address or not, so limits hold across server processes.
  await knex.schema.createTable("sign_in_requests", (t) => {
    t.bigIncrements("id");
    t.text("contact_key").notNullable();
    t.text("ip").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["contact_key", "created_at"]);
    t.index(["ip", "created_at"]);
  });

  await knex.schema.createTable("audit_log", (t) => {
    t.bigIncrements("id");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.integer("company_id").references("companies.id").onDelete("CASCADE");
    t.integer("actor_user_id").references("users.id").onDelete("SET NULL");
    t.text("action").notNullable();
    t.text("subject_type");
    t.text("subject_id");
    t.jsonb("detail").notNullable().defaultTo("{}");
    t.text("ip");
    t.index(["company_id", "at"]);
    t.index(["subject_type", "subject_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("audit_log");
  await knex.schema.dropTable("sign_in_requests");
  await knex.schema.dropTable("sign_in_tokens");
  await knex.raw("DROP TYPE IF EXISTS sign_in_channel");
  await knex.schema.dropTable("sessions");
}
