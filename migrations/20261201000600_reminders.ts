import type { Knex } from "knex";

/**
 * Reminders: homeowners' notification preferences and opt-outs, pending contact changes, a
 * company's optional narrower sending window, and the reminders ledger itself.
 *
 * The ledger is the exactly-once record: one row per (plan, kind, local date, local time, channel),
 * claimed by one worker at a time, frozen text once first claimed, and the provider's id once
 * accepted. See server/features/reminders/README.md.
 */
export async function up(knex: Knex): Promise<void> {
  const hhmm = "'^([01][0-9]|2[0-3]):[0-5][0-9]$'";

  // A company may send only inside a narrower window than the legal 08:00–21:00 (47 CFR § 64.1200(c)(1), from memory).
  await knex.schema.alterTable("companies", (t) => {
    t.text("reminder_window_start").comment("HH:MM local to the recipient; null = 08:00");
    t.text("reminder_window_end").comment("HH:MM local to the recipient; null = 21:00");
  });
  await knex.raw(`ALTER TABLE companies ADD CONSTRAINT companies_reminder_window_valid CHECK (
    (reminder_window_start IS NULL OR (reminder_window_start ~ ${hhmm} AND reminder_window_start BETWEEN '08:00' AND '21:00')) AND
    (reminder_window_end IS NULL OR (reminder_window_end ~ ${hhmm} AND reminder_window_end BETWEEN '08:00' AND '21:00')))`);

  await knex.schema.createTable("notification_preferences", (t) => {
    t.integer("customer_id").primary().references("customers.id").onDelete("CASCADE");
    t.text("channels").notNullable();
    t.text("daily_time").notNullable();
    t.boolean("watering_nudges").notNullable().defaultTo(true);
    t.text("language").notNullable().defaultTo("en");
    t.text("units").notNullable().defaultTo("us");
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(`ALTER TABLE notification_preferences ADD CONSTRAINT notification_preferences_valid CHECK (
    channels IN ('sms', 'email', 'both', 'none') AND daily_time ~ ${hhmm} AND language IN ('en', 'es') AND units IN ('us', 'metric'))`);

  // A row means "send nothing on this channel"; opting in again deletes it (the audit log keeps the history).
  await knex.schema.createTable("channel_opt_outs", (t) => {
    t.integer("customer_id").notNullable().references("customers.id").onDelete("CASCADE");
    t.text("channel").notNullable();
    t.timestamp("opted_out_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("source").notNullable().comment("sms_keyword, email_one_click, provider (Twilio 21610), portal");
    t.primary(["customer_id", "channel"]);
  });
  await knex.raw("ALTER TABLE channel_opt_outs ADD CONSTRAINT channel_opt_outs_channel CHECK (channel IN ('sms', 'email'))");

  // The first text to a customer says how to stop (CTIA); this row records which reminder carried it.
  await knex.schema.createTable("sms_intros", (t) => {
    t.integer("customer_id").primary().references("customers.id").onDelete("CASCADE");
    t.bigInteger("reminder_id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("contact_changes", (t) => {
    t.increments("id");
    t.integer("customer_id").notNullable().references("customers.id").onDelete("CASCADE");
    t.text("kind").notNullable();
    t.text("new_value").notNullable();
    t.text("token_hash").notNullable().unique().comment("SHA-256 of the token sent to the new address");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["customer_id"]);
  });
  await knex.raw("ALTER TABLE contact_changes ADD CONSTRAINT contact_changes_kind CHECK (kind IN ('email', 'phone'))");

  await knex.schema.createTable("reminders", (t) => {
    t.bigIncrements("id");
    t.integer("customer_id").notNullable().references("customers.id").onDelete("CASCADE");
    t.integer("plan_id").notNullable().references("care_plans.id").onDelete("CASCADE");
    t.text("kind").notNullable();
    t.date("local_date").notNullable().comment("the plan day, local to the property");
    t.text("local_time").notNullable().comment("HH:MM wall-clock time asked for (daily time or watering start)");
    t.text("time_zone").notNullable().comment("the property's IANA zone when scheduled; quiet hours are checked in it");
    t.text("channel").notNullable();
    t.timestamp("due_at", { useTz: true }).notNullable().comment("local time in UTC, moved into the allowed window");
    t.timestamp("next_attempt_at", { useTz: true }).notNullable().comment("due_at, or later after a retry back-off");
    t.text("state").notNullable().defaultTo("scheduled");
    t.integer("attempts").notNullable().defaultTo(0);
    t.timestamp("attempt_started_at", { useTz: true });
    t.timestamp("lease_until", { useTz: true }).comment("a worker that dies mid-send loses the row after this");
    t.timestamp("in_doubt_since", { useTz: true }).comment("an attempt since then may have reached the provider; look before resending");
    t.text("last_error");
    t.text("provider_id");
    t.text("subject");
    t.text("body").comment("frozen at first claim, so a resend or a provider look-up uses the same text");
    t.text("html");
    t.bigInteger("fallback_for").references("reminders.id").onDelete("SET NULL");
    t.timestamp("sent_at", { useTz: true });
    t.timestamp("delivered_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["plan_id", "kind", "local_date", "local_time", "channel"], { indexName: "reminders_dedupe_key" });
    t.index(["customer_id", "state"]);
  });
  await knex.raw(`ALTER TABLE reminders ADD CONSTRAINT reminders_valid CHECK (
    kind IN ('daily_summary', 'watering_nudge') AND channel IN ('sms', 'email') AND local_time ~ ${hhmm} AND
    state IN ('scheduled', 'sending', 'sent', 'delivered', 'failed', 'cancelled', 'skipped_opted_out'))`);
  // The worker's two look-ups stay small: due rows, and rows whose worker died mid-send.
  await knex.raw("CREATE INDEX reminders_due_idx ON reminders (next_attempt_at) WHERE state = 'scheduled'");
  await knex.raw("CREATE INDEX reminders_lease_idx ON reminders (lease_until) WHERE state = 'sending'");
  await knex.raw("CREATE INDEX reminders_failed_idx ON reminders (updated_at DESC) WHERE state = 'failed'");
  // One provider message can belong to one reminder only (status callbacks and crash recovery find rows by it).
  await knex.raw("CREATE UNIQUE INDEX reminders_provider_id_idx ON reminders (provider_id) WHERE provider_id IS NOT NULL");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("reminders");
  await knex.schema.dropTable("contact_changes");
  await knex.schema.dropTable("sms_intros");
  await knex.schema.dropTable("channel_opt_outs");
  await knex.schema.dropTable("notification_preferences");
  await knex.raw("ALTER TABLE companies DROP CONSTRAINT IF EXISTS companies_reminder_window_valid");
  await knex.schema.alterTable("companies", (t) => {
    t.dropColumn("reminder_window_start");
    t.dropColumn("reminder_window_end");
  });
}
