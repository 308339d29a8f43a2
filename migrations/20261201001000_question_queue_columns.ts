import type { Knex } from "knex";

/**
 * What the technicians' question queue sorts and filters by, kept on the question itself so the
 * queue is one index range scan even with thousands of open questions: the company (otherwise
 * four joins away) and when a staff answer first followed the question in its thread (the queue
 * puts questions nobody has answered yet first).
 *
 * Kept by triggers rather than by the app's insert, because every writer of messages (the app,
 * seeds, test fixtures, the benchmark's bulk insert) must keep them right.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("messages", (t) => {
    t.integer("company_id").references("companies.id").onDelete("CASCADE");
    t.timestamp("answered_at", { useTz: true }).comment("questions only: when a staff answer first followed it in the thread; it may still be open");
  });
  await knex.raw(`
    UPDATE messages m SET company_id = customers.company_id
    FROM conversations
    JOIN care_plans ON care_plans.id = conversations.plan_id
    JOIN properties ON properties.id = care_plans.property_id
    JOIN customers ON customers.id = properties.customer_id
    WHERE conversations.id = m.conversation_id`);
  await knex.raw(`
    UPDATE messages q SET answered_at = (
      SELECT min(a.created_at) FROM messages a
      WHERE a.conversation_id = q.conversation_id AND a.kind = 'answer' AND a.created_at > q.created_at)
    WHERE q.kind = 'question'`);
  await knex.raw("ALTER TABLE messages ALTER COLUMN company_id SET NOT NULL");

  await knex.raw(`
    CREATE FUNCTION messages_company_of_thread() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      SELECT customers.company_id INTO NEW.company_id
      FROM conversations
      JOIN care_plans ON care_plans.id = conversations.plan_id
      JOIN properties ON properties.id = care_plans.property_id
      JOIN customers ON customers.id = properties.customer_id
      WHERE conversations.id = NEW.conversation_id;
      RETURN NEW;
    END $$`);
  await knex.raw(`
    CREATE TRIGGER messages_company_of_thread BEFORE INSERT OR UPDATE OF conversation_id ON messages
    FOR EACH ROW EXECUTE FUNCTION messages_company_of_thread()`);

  await knex.raw(`
    CREATE FUNCTION messages_mark_questions_answered() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE messages SET answered_at = NEW.created_at
      WHERE conversation_id = NEW.conversation_id AND kind = 'question'
        AND created_at < NEW.created_at AND (answered_at IS NULL OR answered_at > NEW.created_at);
      RETURN NULL;
    END $$`);
  await knex.raw(`
    CREATE TRIGGER messages_mark_questions_answered AFTER INSERT ON messages
    FOR EACH ROW WHEN (NEW.kind = 'answer') EXECUTE FUNCTION messages_mark_questions_answered()`);

  // The queue: a company's open questions, unanswered ones first, then the longest waiting.
  // It replaces the index on all companies' open questions by age, which the queue used to need.
  await knex.raw("DROP INDEX messages_open_questions_idx");
  await knex.raw(`
    CREATE INDEX messages_question_queue_idx ON messages (company_id, (answered_at IS NOT NULL), created_at, id)
    WHERE kind = 'question' AND resolved_at IS NULL`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX messages_question_queue_idx");
  await knex.raw("CREATE INDEX messages_open_questions_idx ON messages (created_at) WHERE kind = 'question' AND resolved_at IS NULL");
  await knex.raw("DROP TRIGGER messages_mark_questions_answered ON messages");
  await knex.raw("DROP FUNCTION messages_mark_questions_answered()");
  await knex.raw("DROP TRIGGER messages_company_of_thread ON messages");
  await knex.raw("DROP FUNCTION messages_company_of_thread()");
  await knex.schema.alterTable("messages", (t) => {
    t.dropColumn("answered_at");
    t.dropColumn("company_id");
  });
}
