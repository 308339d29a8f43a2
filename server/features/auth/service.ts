import type { Config } from "../../config.ts";
import type { Db } from "../../db.ts";
import type { Messenger } from "../../messaging/messenger.ts";
import { HttpError } from "../../http/errors.ts";
import { companyName, findActiveCustomerByContact } from "../../auth/users-repo.ts";
import { contactKey, parseContact, type Contact } from "./contact.ts";
import { hashToken, newSignInToken } from "./tokens.ts";
import * as repo from "./repo.ts";
import { signInEmail, signInSms } from "./link-message.ts";

/** Limits per 15 minutes; counted in PostgreSQL so they hold across server processes. */
export const signInLimits = { windowMinutes: 15, perContact: 5, perIp: 30 };

export type SignInDeps = { config: Config; db: Db; messenger: Messenger; log: (message: string, err?: unknown) => void };

/**
 * Issues a one-time link when the contact belongs to an active homeowner. The caller
 * always answers the same way, so nobody can probe which addresses are customers.
 */
/** `next`: an already validated portal path (see shared/schemas/next-path.ts) the link returns to after sign-in. */
export async function requestSignInLink(deps: SignInDeps, rawContact: string, ip: string, next?: string): Promise<void> {
  const contact = parseContact(rawContact);
  if (!contact) {
    throw new HttpError(400, "invalid_input", "Some of the information is not valid.", {
      contact: "Enter a valid e-mail address or mobile number",
    });
  }
  const key = contactKey(contact);
  const { windowMinutes, perContact, perIp } = signInLimits;
  const [byContact, byIp] = await Promise.all([
    repo.countRecentRequests(deps.db, "contact_key", key, windowMinutes),
    repo.countRecentRequests(deps.db, "ip", ip, windowMinutes),
  ]);
  if (byContact >= perContact || byIp >= perIp) {
    throw new HttpError(429, "rate_limited", "Too many sign-in links were requested. Please wait a few minutes and try again.", undefined, {
      "Retry-After": String(windowMinutes * 60),
    });
  }
  await repo.recordRequest(deps.db, key, ip);

  const user = await findActiveCustomerByContact(deps.db, contact);
  if (!user) return;
  const token = newSignInToken();
  const minutes = deps.config.SIGN_IN_LINK_MINUTES;
  // Only the newest link works: an older one left in an inbox or a forwarded text cannot sign in.
  await repo.retireUnusedTokens(deps.db, user.id);
  await repo.insertToken(deps.db, { userId: user.id, tokenHash: hashToken(token), channel: contact.email ? "email" : "sms", minutes });
  const url = new URL(`/portal/sign-in/verify?token=${token}`, deps.config.PUBLIC_URL);
  if (next) url.searchParams.set("next", next);
  const link = url.href;

  // Not awaited: waiting for the provider would make known addresses answer slower than unknown ones.
  void sendLink(deps, user.companyId, user.name, contact, link, minutes).catch((err) =>
    deps.log(`sign-in link for user ${user.id} could not be sent`, err),
  );
}

async function sendLink(deps: SignInDeps, companyId: number, name: string, contact: Contact, link: string, minutes: number) {
  const company = await deps.db("companies").where({ id: companyId }).first<{ name: string; sms_sender_name: string }>("name", "sms_sender_name");
  if (contact.email !== undefined) {
    await deps.messenger.sendEmail(signInEmail(contact.email, name.split(" ")[0] ?? name, company?.name ?? "", link, minutes));
  } else {
    await deps.messenger.sendSms(signInSms(contact.phone, company?.sms_sender_name ?? "", link, minutes));
  }
}

/** Returns the user id the link signs in, or explains why it cannot be used. */
export async function consumeSignInLink(db: Db, token: string): Promise<number> {
  const tokenHash = hashToken(token);
  const userId = await repo.useToken(db, tokenHash);
  if (userId !== undefined) return userId;
  const state = await repo.tokenState(db, tokenHash);
  if (state === "used") throw new HttpError(410, "link_used", "This sign-in link has already been used. Ask for a new one.");
  if (state === "expired") throw new HttpError(410, "link_expired", "This sign-in link has expired. Ask for a new one.");
  throw new HttpError(400, "link_invalid", "This sign-in link is not valid. Ask for a new one.");
}

/**
 * "Sign out everywhere": every session of this person ends, this one included, and links
 * not yet used are retired too, since a link in a lost phone's inbox is a session waiting to start.
 */
export async function signOutEverywhere(db: Db, userId: number): Promise<void> {
  await db.transaction(async (trx) => {
    await repo.endAllSessions(trx, userId);
    await repo.retireUnusedTokens(trx, userId);
  });
}

export { companyName };
