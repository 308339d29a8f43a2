import type { Db } from "../../db.ts";
import type { Config } from "../../config.ts";
import type { Messenger, OutgoingEmail, OutgoingSms } from "../../messaging/messenger.ts";
import { hashToken, newSignInToken } from "./tokens.ts";
import { insertToken } from "./repo.ts";
import { escapeHtml } from "../../messaging/escape-html.ts";

/** An invitation may sit unread for a while after the visit; it still works once only. */
export const invitationDays = 7;

type Invitee = { userId: number; firstName: string; email: string | null; phone: string | null; companyName: string; smsSenderName: string };

async function invitee(db: Db, planId: number): Promise<Invitee | undefined> {
  const row = await db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .join("users", "users.id", "customers.user_id")
    .join("companies", "companies.id", "customers.company_id")
    .where("care_plans.id", planId)
    .andWhere("users.active", true)
    .first<{ user_id: number; first_name: string; email: string | null; phone: string | null; name: string; sms_sender_name: string } | undefined>(
      "users.id as user_id", "customers.first_name", "users.email", "users.phone", "companies.name", "companies.sms_sender_name",
    );
  return row && { userId: row.user_id, firstName: row.first_name, email: row.email, phone: row.phone, companyName: row.name, smsSenderName: row.sms_sender_name };
}

function invitationEmail(to: string, who: Invitee, link: string): OutgoingEmail {
  const text = [
    `Hello ${who.firstName},`,
    "",
    `${who.companyName} has made a day-by-day care plan for your lawn after today's visit: what to water and when, when to mow, and what to keep off the new grass.`,
    "",
    `Open your plan: ${link}`,
    "",
    `The link works once and for ${invitationDays} days. After that, ask for a new one on the sign-in page.`,
  ].join("\n");
  const html = `<p>Hello ${escapeHtml(who.firstName)},</p>
<p>${escapeHtml(who.companyName)} has made a day-by-day care plan for your lawn after today's visit: what to water and when, when to mow, and what to keep off the new grass.</p>
<p><a href="${escapeHtml(link)}">Open your care plan</a></p>
<p>The link works once and for ${invitationDays} days. After that, ask for a new one on the sign-in page.</p>`;
  return { to, subject: `Your lawn care plan from ${who.companyName}`, text, html };
}

function invitationSms(to: string, who: Invitee, link: string): OutgoingSms {
  return { to, body: `${who.smsSenderName}: your lawn care plan is ready. Open it here (works once): ${link}` };
}

/**
 * After a seeding visit the homeowner gets a one-time link to their new plan, by e-mail when
 * we have an address, else by text. Returns whether a message went out.
 */
export async function inviteToPlan(deps: { db: Db; config: Config; messenger: Messenger }, planId: number): Promise<boolean> {
  const who = await invitee(deps.db, planId);
  if (!who || (!who.email && !who.phone)) return false;
  const token = newSignInToken();
  await insertToken(deps.db, { userId: who.userId, tokenHash: hashToken(token), channel: who.email ? "email" : "sms", minutes: invitationDays * 24 * 60 });
  const link = `${deps.config.PUBLIC_URL}/portal/sign-in/verify?token=${token}`;
  if (who.email) await deps.messenger.sendEmail(invitationEmail(who.email, who, link));
  else await deps.messenger.sendSms(invitationSms(who.phone!, who, link));
  return true;
}
