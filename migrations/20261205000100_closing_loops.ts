import type { Knex } from "knex";

/**
 * What it takes for every action to reach the person it concerns:
 *  - the reminders ledger also carries notices (answers, visit changes, the welcome message), so
 *    they get its exactly-once sending, quiet hours and fallbacks; `context` says what a notice is about;
 *  - messages remember how they arrived (portal, text, e-mail reply) and the provider's id, so a
 *    reply delivered twice is stored once and an answer goes back the way the question came;
 *  - each conversation has an unguessable reply token for its e-mail reply address;
 *  - texts and e-mails from senders we can't match are kept for managers;
 *  - follow-up visits carry what the homeowner sees and how they answered;
 *  - the company's own phone number and logo.
 */
const reminderKindsBefore = ["daily_summary", "watering_nudge"];
const reminderKinds = [...reminderKindsBefore, "conversation_update", "visit_update", "welcome"];
const stateCheck = "state IN ('scheduled', 'sending', 'sent', 'delivered', 'failed', 'cancelled', 'skipped_opted_out')";
const hhmm = "'^([01][0-9]|2[0-3]):[0-5][0-9]$'";

function reminderCheck(kinds: string[]): string {
  return `ALTER TABLE reminders ADD CONSTRAINT reminders_valid CHECK (
    kind IN (${kinds.map((k) => `'${k}'`).join(", ")}) AND channel IN ('sms', 'email') AND local_time ~ ${hhmm} AND ${stateCheck})`;
}

export async function up(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE reminders DROP CONSTRAINT reminders_valid");
  await knex.raw(reminderCheck(reminderKinds));
  await knex.schema.alterTable("reminders", (t) => {
    t.jsonb("context").comment("notices only: what the notice is about, e.g. { followUpId, change }");
  });

  await knex.schema.alterTable("messages", (t) => {
    t.text("source").notNullable().defaultTo("portal").comment("how it reached us: portal, sms, email; staff messages: portal");
    t.text("external_id").comment("the provider's id of an inbound text (MessageSid) or e-mail (Message-ID)");
    t.integer("follow_up_id").references("follow_up_visits.id").onDelete("SET NULL").comment("a message about a follow-up visit");
  });
  await knex.raw("ALTER TABLE messages ADD CONSTRAINT messages_source_valid CHECK (source IN ('portal', 'sms', 'email'))");
  await knex.raw("CREATE UNIQUE INDEX messages_external_id_idx ON messages (source, external_id) WHERE external_id IS NOT NULL");

  await knex.schema.alterTable("conversations", (t) => {
    t.text("reply_token").unique().comment("random; the local part of this conversation's e-mail reply address");
  });

  await knex.schema.createTable("unmatched_inbound", (t) => {
    t.bigIncrements("id");
    t.integer("company_id").references("companies.id").onDelete("CASCADE").comment("the company whose number or address received it, where known");
    t.text("channel").notNullable();
    t.text("sender").notNullable().comment("E.164 number or e-mail address as received");
    t.text("body").notNullable();
    t.integer("media_count").notNullable().defaultTo(0);
    t.text("external_id");
    t.timestamp("received_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("handled_at", { useTz: true });
    t.integer("handled_by").references("users.id").onDelete("SET NULL");
    t.index(["company_id", "received_at"]);
  });
  await knex.raw("ALTER TABLE unmatched_inbound ADD CONSTRAINT unmatched_inbound_channel CHECK (channel IN ('sms', 'email'))");
  await knex.raw("CREATE UNIQUE INDEX unmatched_inbound_external_id_idx ON unmatched_inbound (channel, external_id) WHERE external_id IS NOT NULL");

  await knex.schema.alterTable("follow_up_visits", (t) => {
    t.text("arrival_start").comment("HH:MM local; the arrival window the homeowner is told");
    t.text("arrival_end");
    t.text("customer_prep").comment("what the homeowner should do before the visit, in their words");
    t.text("work_done").comment("what the crew did, shown in the homeowner's history");
    t.text("customer_response").comment("confirmed, or another_day when the homeowner asked to move it");
    t.timestamp("customer_responded_at", { useTz: true });
  });
  await knex.raw(`ALTER TABLE follow_up_visits ADD CONSTRAINT follow_up_visits_customer_fields CHECK (
    (arrival_start IS NULL OR arrival_start ~ ${hhmm}) AND (arrival_end IS NULL OR arrival_end ~ ${hhmm}) AND
    (customer_response IS NULL OR customer_response IN ('confirmed', 'another_day')))`);

  await knex.schema.alterTable("companies", (t) => {
    t.text("phone").comment("the office's number in E.164, shown to homeowners to call or text");
    t.text("logo_key").comment("storage key of the uploaded logo (re-encoded PNG)");
    t.timestamp("logo_updated_at", { useTz: true });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("companies", (t) => {
    t.dropColumn("logo_updated_at");
    t.dropColumn("logo_key");
    t.dropColumn("phone");
  });
  await knex.raw("ALTER TABLE follow_up_visits DROP CONSTRAINT follow_up_visits_customer_fields");
  await knex.schema.alterTable("follow_up_visits", (t) => {
    for (const c of ["arrival_start", "arrival_end", "customer_prep", "work_done", "customer_response", "customer_responded_at"]) t.dropColumn(c);
  });
  await knex.schema.dropTable("unmatched_inbound");
  await knex.schema.alterTable("conversations", (t) => t.dropColumn("reply_token"));
  await knex.raw("DROP INDEX messages_external_id_idx");
  await knex.raw("ALTER TABLE messages DROP CONSTRAINT messages_source_valid");
  await knex.schema.alterTable("messages", (t) => {
    t.dropColumn("follow_up_id");
    t.dropColumn("external_id");
    t.dropColumn("source");
  });
  await knex.schema.alterTable("reminders", (t) => t.dropColumn("context"));
  await knex("reminders").whereNotIn("kind", reminderKindsBefore).delete();
  await knex.raw("ALTER TABLE reminders DROP CONSTRAINT reminders_valid");
  await knex.raw(reminderCheck(reminderKindsBefore));
}
