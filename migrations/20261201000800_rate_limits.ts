import type { Knex } from "knex";

/** Fixed-window request counters shared by every server process (express-rate-limit's store). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("rate_limit_hits", (t) => {
    t.text("key").primary();
    t.integer("hits").notNullable();
    t.timestamp("reset_at", { useTz: true }).notNullable();
    t.index(["reset_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("rate_limit_hits");
}
