import type { Db } from "../../db.ts";
import type { Config } from "../../config.ts";
import { hashToken, newSignInToken } from "./tokens.ts";
import { insertToken } from "./repo.ts";

/** A welcome may sit unread for a while after the visit; its link still works once only. */
export const invitationDays = 7;

/**
 * A one-tap sign-in link for a homeowner's first message (the welcome notice): a fresh one-time
 * token, valid for `invitationDays`, recorded against the channel that carries it.
 */
export async function oneTapSignInLink(db: Db, config: Pick<Config, "PUBLIC_URL">, userId: number, channel: "email" | "sms"): Promise<string> {
  const token = newSignInToken();
  await insertToken(db, { userId, tokenHash: hashToken(token), channel, minutes: invitationDays * 24 * 60 });
  return new URL(`/portal/sign-in/verify?token=${token}`, config.PUBLIC_URL).href;
}
