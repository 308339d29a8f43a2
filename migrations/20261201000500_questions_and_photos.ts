import type { Knex } from "knex";

/**
 * The conversation thread of each care plan (questions, answers, staff notes), the photos
 * attached to messages, and homeowners' secret calendar-feed links.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("conversations", (t) => {
    t.increments("id");
    t.integer("plan_id").notNullable().unique().references("care_plans.id").onDelete("CASCADE");
    // One mark per side: any staff member reading the thread reads it for the company.
    t.timestamp("customer_last_read_at", { useTz: true });
    t.timestamp("staff_last_read_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("messages", (t) => {
    t.bigIncrements("id");
    t.integer("conversation_id").notNullable().references("conversations.id").onDelete("CASCADE");
    t.enu("kind", ["question", "answer", "check_in_request", "note"], { useNative: true, enumName: "message_kind" }).notNullable();
    t.integer("author_user_id").references("users.id").onDelete("SET NULL").comment("null for messages the system wrote");
    t.text("text").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("resolved_at", { useTz: true }).comment("questions only: when staff marked it answered");
    t.integer("resolved_by").references("users.id").onDelete("SET NULL");
    t.integer("assigned_to").references("users.id").onDelete("SET NULL");
    t.index(["conversation_id", "created_at"]);
  });
  await knex.raw("ALTER TABLE messages ADD CONSTRAINT messages_resolved_only_questions CHECK (resolved_at IS NULL OR kind = 'question')");
  // The question queue: open questions, oldest first. Stays small because answered ones leave it.
  await knex.raw("CREATE INDEX messages_open_questions_idx ON messages (created_at) WHERE kind = 'question' AND resolved_at IS NULL");

  await knex.schema.createTable("photos", (t) => {
    t.bigIncrements("id");
    t.bigInteger("message_id").notNullable().references("messages.id").onDelete("CASCADE");
    t.smallint("position").notNullable();
    // Random keys in the storage adapter; the uploaded file name is never used.
    t.text("large_key").notNullable().unique();
    t.text("thumb_key").notNullable().unique();
    t.text("content_type").notNullable().defaultTo("image/jpeg");
    t.integer("width").notNullable();
    t.integer("height").notNullable();
    t.integer("bytes").notNullable().comment("size of the stored large copy");
    t.integer("thumb_bytes").notNullable();
    t.text("sha256").notNullable().comment("of the bytes as uploaded, to spot the same photo sent twice");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["message_id", "position"]);
  });

  await knex.schema.createTable("calendar_feeds", (t) => {
    t.increments("id");
    t.integer("customer_id").notNullable().references("customers.id").onDelete("CASCADE");
    t.text("token_hash").notNullable().unique().comment("SHA-256 of the secret token: feed requests are looked up by it");
    t.text("token_sealed").notNullable().comment("the token encrypted with a server key, so the homeowner can see the link again");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("revoked_at", { useTz: true });
  });
  await knex.raw("CREATE UNIQUE INDEX calendar_feeds_one_active_idx ON calendar_feeds (customer_id) WHERE revoked_at IS NULL");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("calendar_feeds");
  await knex.schema.dropTable("photos");
  await knex.schema.dropTable("messages");
  await knex.raw("DROP TYPE IF EXISTS message_kind");
  await knex.schema.dropTable("conversations");
}
