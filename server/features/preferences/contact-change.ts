import type { Config } from "../../config.ts";
import type { Db } from "../../db.ts";
import type { Messenger } from "../../messaging/messenger.ts";
import { escapeHtml } from "../../messaging/escape-html.ts";
import { HttpError } from "../../http/errors.ts";
import { parseContact } from "../auth/contact.ts";
import { hashToken, newSignInToken } from "../auth/tokens.ts";
import { reconcileCustomerReminders } from "../reminders/reconcile.ts";

/*
 * A new e-mail address or mobile number applies only once someone at that address follows the link
 * we send there: otherwise a typo (or a hijacked session) would redirect a customer's reminders and
 * sign-in links to a stranger. Tokens are random, stored hashed, single-use and expire in a day.
 */
export const CONTACT_CHANGE_HOURS = 24;
/** Requests per customer per hour: each one sends a message to an address the customer typed. */
export const CONTACT_CHANGES_PER_HOUR = 5;

export type ContactKind = "email" | "phone";

export function confirmUrl(config: Pick<Config, "PUBLIC_URL">, token: string): string {
  const url = new URL("/api/my/contact/confirm", config.PUBLIC_URL);
  url.searchParams.set("token", token);
  return url.href;
}

export async function requestContactChange(
  deps: { db: Db; config: Config; messenger: Messenger; log: (message: string, err?: unknown) => void },
  customerId: number,
  change: { email?: string; phone?: string },
): Promise<ContactKind[]> {
  const wanted: { kind: ContactKind; value: string }[] = [];
  if (change.email !== undefined) wanted.push({ kind: "email", value: change.email.trim().toLowerCase() });
  if (change.phone !== undefined) {
    const parsed = parseContact(change.phone);
    if (!parsed?.phone) throw new HttpError(400, "invalid_input", "Some of the information is not valid.", { phone: "Enter a valid mobile number" });
    wanted.push({ kind: "phone", value: parsed.phone });
  }
  const recent = await deps.db("contact_changes")
    .where({ customer_id: customerId })
    .andWhere("created_at", ">", deps.db.raw("now() - interval '1 hour'"))
    .count<{ count: string }[]>("* as count");
  if (Number(recent[0]?.count ?? 0) + wanted.length > CONTACT_CHANGES_PER_HOUR) {
    throw new HttpError(429, "rate_limited", "Too many changes were requested. Please wait an hour and try again.", undefined, { "Retry-After": "3600" });
  }
  const company = await deps.db("customers")
    .join("companies", "companies.id", "customers.company_id")
    .where("customers.id", customerId)
    .first<{ name: string; sms_sender_name: string }>("companies.name", "companies.sms_sender_name");

  for (const { kind, value } of wanted) {
    const token = newSignInToken();
    await deps.db("contact_changes").insert({
      customer_id: customerId,
      kind,
      new_value: value,
      token_hash: hashToken(token),
      expires_at: deps.db.raw("now() + make_interval(hours => ?)", [CONTACT_CHANGE_HOURS]),
    });
    const link = confirmUrl(deps.config, token);
    const send =
      kind === "email"
        ? deps.messenger.sendEmail({
            to: value,
            subject: `Confirm your new e-mail address for ${company.name}`,
            text: `Please confirm this address for your lawn care plan reminders from ${company.name}:\n${link}\n\nThe link works once, for ${CONTACT_CHANGE_HOURS} hours. If you did not ask for this, ignore this message.`,
            html: `<p>Please confirm this address for your lawn care plan reminders from ${escapeHtml(company.name)}:</p><p><a href="${escapeHtml(link)}">Confirm my e-mail address</a></p><p>The link works once, for ${CONTACT_CHANGE_HOURS} hours. If you did not ask for this, ignore this message.</p>`,
          })
        : deps.messenger.sendSms({ to: value, body: `${company.sms_sender_name}: confirm this number for your lawn care reminders: ${link} (works once, ${CONTACT_CHANGE_HOURS} h)` });
    // Not awaited by the request: a slow provider should not hold the page; a failure is logged.
    void send.catch((err) => deps.log(`contact change confirmation to a new ${kind} for customer ${customerId} could not be sent`, err));
  }
  return wanted.map((w) => w.kind);
}

export type ConfirmResult = { kind: ContactKind; value: string; customerId: number };

/** Applies a confirmed change in one transaction; the token is used up in the same statement that checks it. */
export async function confirmContactChange(db: Db, token: string): Promise<ConfirmResult> {
  return db.transaction(async (trx) => {
    const [change] = await trx("contact_changes")
      .where({ token_hash: hashToken(token) })
      .whereNull("used_at")
      .andWhere("expires_at", ">", trx.fn.now())
      .update({ used_at: trx.fn.now() })
      .returning<{ customer_id: number; kind: ContactKind; new_value: string }[]>(["customer_id", "kind", "new_value"]);
    if (!change) {
      const known = await trx("contact_changes").where({ token_hash: hashToken(token) }).first<{ used_at: Date | null } | undefined>("used_at");
      if (known?.used_at) throw new HttpError(410, "link_used", "This confirmation link has already been used.");
      if (known) throw new HttpError(410, "link_expired", "This confirmation link has expired. Ask for a new one.");
      throw new HttpError(400, "link_invalid", "This confirmation link is not valid.");
    }
    const customer = await trx("customers").where({ id: change.customer_id }).first<{ user_id: number; company_id: number }>("user_id", "company_id");
    try {
      await trx("users").where({ id: customer.user_id }).update({ [change.kind]: change.new_value });
    } catch (error) {
      // The whole change rolls back, token included, so it can be used once the clash is sorted out.
      if ((error as { code?: string }).code === "23505") throw new HttpError(409, "contact_in_use", "That address belongs to another account. Contact your lawn care company.");
      throw error;
    }
    // A new number has never had the "how to stop" text.
    if (change.kind === "phone") await trx("sms_intros").where({ customer_id: change.customer_id }).delete();
    await trx("audit_log").insert({
      company_id: customer.company_id,
      actor_user_id: customer.user_id,
      action: "customer.contact_changed",
      subject_type: "customer",
      subject_id: String(change.customer_id),
      detail: JSON.stringify({ kind: change.kind }),
    });
    await reconcileCustomerReminders(trx, change.customer_id);
    return { kind: change.kind, value: change.new_value, customerId: change.customer_id };
  });
}
