import type { Db } from "../../db.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { optIn, optOut } from "../preferences/repo.ts";
import { reconcileCustomerReminders, reconcilePlanReminders } from "../reminders/reconcile.ts";
import { keywordOf } from "./keywords.ts";
import { replies } from "./replies.ts";

type Texter = { customerId: number; userId: number; senderName: string; companyName: string };

/** The customer whose mobile number texted us (numbers are unique across users, stored in E.164). */
async function findTexter(db: Db, phone: string): Promise<Texter | undefined> {
  const row = await db("users")
    .join("customers", "customers.user_id", "users.id")
    .join("companies", "companies.id", "customers.company_id")
    .where({ "users.phone": phone, "users.role": "customer" })
    .first<{ customer_id: number; user_id: number; sms_sender_name: string; name: string } | undefined>(
      "customers.id as customer_id",
      "users.id as user_id",
      "companies.sms_sender_name",
      "companies.name",
    );
  return row && { customerId: row.customer_id, userId: row.user_id, senderName: row.sms_sender_name, companyName: row.name };
}

/**
 * A number we don't know still gets an answer to STOP and HELP, in the name of the company
 * this deployment (and so its SMS number) serves: the oldest, as GET /api/company has it.
 */
async function fallbackSender(db: Db): Promise<{ senderName: string; companyName: string }> {
  const company = await db("companies").orderBy("id").first<{ sms_sender_name: string; name: string } | undefined>("sms_sender_name", "name");
  return company ? { senderName: company.sms_sender_name, companyName: company.name } : { senderName: "Sproutline", companyName: "your lawn care company" };
}

/** Marks today's pending watering steps done on every active plan of the customer; returns how many. */
async function markTodaysWateringDone(db: Db, texter: Texter): Promise<number> {
  return db.transaction(async (trx) => {
    const plans = await trx("care_plans")
      .join("properties", "properties.id", "care_plans.property_id")
      .where({ "properties.customer_id": texter.customerId, "care_plans.status": "active" })
      .select<{ id: number; time_zone: string }[]>("care_plans.id", "properties.time_zone");
    let count = 0;
    for (const plan of plans) {
      const done = await trx("plan_steps")
        .where({ plan_id: plan.id, date: localDateAt(plan.time_zone), kind: "water", state: "pending" })
        .update({ state: "done", state_changed_at: trx.fn.now(), state_changed_by: texter.userId, skip_reason: null });
      if (done > 0) {
        count += done;
        // The rest of today's watering nudges are cancelled in the same transaction.
        await reconcilePlanReminders(trx, plan.id);
      }
    }
    return count;
  });
}

/** Handles one inbound text and returns the reply texts (possibly none). */
export async function handleInboundText(db: Db, from: string, body: string): Promise<string[]> {
  const keyword = keywordOf(body);
  if (!keyword) return [];
  const texter = await findTexter(db, from);
  const { senderName, companyName } = texter ?? (await fallbackSender(db));
  switch (keyword) {
    case "stop":
      if (texter) {
        await db.transaction(async (trx) => {
          await optOut(trx, texter.customerId, "sms", "sms_keyword");
          await reconcileCustomerReminders(trx, texter.customerId);
        });
      }
      return [replies.stop(senderName)];
    case "start":
      if (texter) {
        await db.transaction(async (trx) => {
          await optIn(trx, texter.customerId, "sms", "sms_keyword");
          await reconcileCustomerReminders(trx, texter.customerId);
        });
      }
      return [replies.start(senderName)];
    case "help":
      return [replies.help(senderName, companyName)];
    case "done":
      return texter ? [replies.done(senderName, await markTodaysWateringDone(db, texter))] : [];
  }
}
