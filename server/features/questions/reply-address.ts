import { randomBytes } from "node:crypto";
import type { Db } from "../../db.ts";
import { ensureConversation } from "./repo.ts";

/*
 * Every conversation has an e-mail reply address, reply+<token>@<inbound domain>. The token is
 * 128 random bits, so an address can't be guessed from another one or from a plan id; a reply
 * sent to it is filed in that conversation. Tokens are made on first use and never change.
 */
const PREFIX = "reply+";

export async function replyTokenForPlan(db: Db, planId: number): Promise<string> {
  const conversation = await ensureConversation(db, planId);
  await db("conversations").where({ id: conversation.id }).whereNull("reply_token").update({ reply_token: randomBytes(16).toString("base64url") });
  return (await db("conversations").where({ id: conversation.id }).first<{ reply_token: string }>("reply_token")).reply_token;
}

export const replyAddress = (token: string, domain: string) => `${PREFIX}${token}@${domain}`;

/** The token of a reply address at our domain, or null for any other address. */
export function tokenFromAddress(address: string, domain: string): string | null {
  const at = address.lastIndexOf("@");
  if (at < 0 || address.slice(at + 1).toLowerCase() !== domain.toLowerCase()) return null;
  const local = address.slice(0, at);
  if (!local.toLowerCase().startsWith(PREFIX)) return null;
  const token = local.slice(PREFIX.length);
  return /^[A-Za-z0-9_-]{16,64}$/.test(token) ? token : null;
}

export async function conversationOfToken(db: Db, token: string): Promise<{ conversationId: number; planId: number } | undefined> {
  const row = await db("conversations").where({ reply_token: token }).first<{ id: number; plan_id: number } | undefined>("id", "plan_id");
  return row && { conversationId: row.id, planId: row.plan_id };
}
