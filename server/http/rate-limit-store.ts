import type { ClientRateLimitInfo, Options, Store } from "express-rate-limit";
import type { Db } from "../db.ts";

/**
 * express-rate-limit's counters in PostgreSQL, so a limit holds across server processes.
 * One upsert per hit: a window that has ended starts again at 1. (The published PostgreSQL
 * store brings its own migration runner and an older pinned `pg`; ours lives in our
 * migrations and uses the app's pool.)
 */
export class PostgresRateLimitStore implements Store {
  private windowMs = 60_000;
  readonly localKeys = false;

  constructor(
    private readonly db: Db,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const { rows } = await this.db.raw<{ rows: { hits: number; reset_at: Date }[] }>(
      `insert into rate_limit_hits (key, hits, reset_at)
       values (?, 1, now() + make_interval(secs => ?))
       on conflict (key) do update set
         hits = case when rate_limit_hits.reset_at <= now() then 1 else rate_limit_hits.hits + 1 end,
         reset_at = case when rate_limit_hits.reset_at <= now() then excluded.reset_at else rate_limit_hits.reset_at end
       returning hits, reset_at`,
      [this.prefix + key, this.windowMs / 1000],
    );
    const row = rows[0]!;
    return { totalHits: row.hits, resetTime: row.reset_at };
  }

  async decrement(key: string): Promise<void> {
    await this.db("rate_limit_hits").where({ key: this.prefix + key }).andWhere("hits", ">", 0).decrement("hits", 1);
  }

  async resetKey(key: string): Promise<void> {
    await this.db("rate_limit_hits").where({ key: this.prefix + key }).delete();
  }
}
