import type { Db } from "../../db.ts";
import { customerContacts, loadPreferences, optedOutChannels } from "../preferences/repo.ts";
import { fallbackChannel } from "./channels.ts";
import { insertFallback, type ReminderRow } from "./ledger.ts";

/**
 * A reminder the provider reported undelivered after accepting it (status callback): try the other
 * channel if the customer allows it. Fallbacks of fallbacks are not made, so two bad channels end
 * in one failed row each, visible to staff, rather than a loop.
 */
export async function fallBackAfterDeliveryFailure(db: Db, reminderId: number): Promise<boolean> {
  const row = await db("reminders").where({ id: reminderId }).first<ReminderRow | undefined>();
  if (!row || row.fallback_for) return false;
  const contacts = await customerContacts(db, row.customer_id);
  if (!contacts) return false;
  const [preferences, optedOut] = await Promise.all([loadPreferences(db, row.customer_id, contacts), optedOutChannels(db, row.customer_id)]);
  const channel = fallbackChannel(row.channel, preferences.channels, contacts, new Set(optedOut));
  return channel ? insertFallback(db, row, channel) : false;
}
