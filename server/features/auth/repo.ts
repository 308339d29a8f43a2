import type { Db } from "../../db.ts";

export async function countRecentRequests(db: Db, column: "contact_key" | "ip", value: string, windowMinutes: number): Promise<number> {
  const row = await db("sign_in_requests")
    .where(column, value)
    .andWhere("created_at", ">", db.raw(`now() - make_interval(mins => ?)`, [windowMinutes]))
    .count<{ count: string }[]>("* as count")
    .first();
  return Number(row?.count ?? 0);
}

export async function recordRequest(db: Db, contactKey: string, ip: string): Promise<void> {
  await db("sign_in_requests").insert({ contact_key: contactKey, ip });
}

export async function insertToken(db: Db, row: { userId: number; tokenHash: string; channel: "email" | "sms"; minutes: number }) {
  await db("sign_in_tokens").insert({
    user_id: row.userId,
    token_hash: row.tokenHash,
    channel: row.channel,
    expires_at: db.raw("now() + make_interval(mins => ?)", [row.minutes]),
  });
}

/**
 * Marks the token used in one statement, so two simultaneous clicks (or two server
 * processes) cannot both sign in with it.
 */
export async function useToken(db: Db, tokenHash: string): Promise<number | undefined> {
  const rows = await db("sign_in_tokens")
    .where({ token_hash: tokenHash })
    .whereNull("used_at")
    .andWhere("expires_at", ">", db.fn.now())
    .update({ used_at: db.fn.now() })
    .returning<{ user_id: number }[]>("user_id");
  return rows[0]?.user_id;
}

export async function tokenState(db: Db, tokenHash: string): Promise<"unknown" | "used" | "expired"> {
  const row = await db("sign_in_tokens")
    .where({ token_hash: tokenHash })
    .first<{ used_at: Date | null }>("used_at");
  if (!row) return "unknown";
  return row.used_at ? "used" : "expired";
}

/**
 * Ends every session of one person, the current one included. Matches the expression of
 * `sessions_user_idx`, so it finds them without reading the whole table.
 */
export async function endAllSessions(db: Db, userId: number): Promise<number> {
  return db("sessions").whereRaw("(sess -> 'passport' ->> 'user') = ?", [String(userId)]).delete();
}

/**
 * Unused sign-in links of one person stop working now. They read as expired afterwards,
 * which tells the homeowner what to do: ask for a new one.
 */
export async function retireUnusedTokens(db: Db, userId: number): Promise<void> {
  await db("sign_in_tokens")
    .where({ user_id: userId })
    .whereNull("used_at")
    .andWhere("expires_at", ">", db.fn.now())
    .update({ expires_at: db.fn.now() });
}
