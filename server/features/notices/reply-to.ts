import { randomBytes } from "node:crypto";
import type { Db } from "../../db.ts";
import { replyTokenForPlan } from "../questions/reply-address.ts";

/**
 * The reply tokens of many plans' conversations in one round trip (conversations and tokens are
 * made where missing), so giving every e-mail of a morning burst its Reply-To costs the worker one
 * statement per batch rather than several per message. Same tokens as replyTokenForPlan.
 */
export async function replyTokensForPlans(db: Db, planIds: number[]): Promise<Map<number, string>> {
  const unique = [...new Set(planIds)];
  if (unique.length === 0) return new Map();
  const { rows } = await db.raw<{ rows: { plan_id: number; reply_token: string }[] }>(
    `WITH wanted AS (SELECT * FROM unnest(?::int[], ?::text[]) AS w(plan_id, token)),
     made AS (
       INSERT INTO conversations (plan_id, reply_token) SELECT plan_id, token FROM wanted
       ON CONFLICT (plan_id) DO UPDATE SET reply_token = EXCLUDED.reply_token WHERE conversations.reply_token IS NULL
       RETURNING plan_id, reply_token)
     SELECT plan_id, reply_token FROM made
     UNION ALL
     SELECT c.plan_id, c.reply_token FROM conversations c JOIN wanted USING (plan_id)
      WHERE c.reply_token IS NOT NULL AND c.plan_id NOT IN (SELECT plan_id FROM made)`,
    [unique, unique.map(() => randomBytes(16).toString("base64url"))],
  );
  const tokens = new Map(rows.map((r) => [Number(r.plan_id), r.reply_token]));
  // A conversation another process was creating at this very moment: ask again the slow way.
  for (const planId of unique) if (!tokens.has(planId)) tokens.set(planId, await replyTokenForPlan(db, planId));
  return tokens;
}
