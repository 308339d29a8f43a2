import type { Db } from "../../db.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { optIn, optOut } from "../preferences/repo.ts";
import { reconcileCustomerReminders, reconcilePlanReminders } from "../reminders/reconcile.ts";
import { keywordOf, type Keyword } from "./keywords.ts";
import type { InboundMedia } from "./media.ts";
import { replies } from "./replies.ts";
import { currentPlanId, fallbackCompany, findTexter, insertUnmatched, textAlreadyFiled, unmatchedRecently, type Company, type Texter } from "./repo.ts";
import { fileTextedQuestion, type InboundDeps } from "./texted-question.ts";

export type InboundText = { from: string; body: string; messageSid: string | null; media: readonly InboundMedia[] };

/**
 * A number that isn't matched to a plan gets one reply per this many hours, however many texts
 * it sends: enough to tell a person how to reach the office, never a conversation with a bot
 * (or with another automated sender that answers every text).
 */
export const UNMATCHED_REPLY_HOURS = 24;

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

async function handleKeyword(db: Db, from: string, keyword: Keyword): Promise<string[]> {
  const texter = await findTexter(db, from);
  const { senderName, companyName } = texter ?? (await fallbackCompany(db));
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

/**
 * Keeps a text we can't file on a plan for managers, and answers it at most once a day per number.
 * A repeated webhook (same MessageSid) is neither kept twice nor answered twice.
 */
async function keepUnmatched(db: Db, text: InboundText, company: Company, reply: string): Promise<string[]> {
  return db.transaction(async (trx) => {
    // Two texts from one number arriving together (several server processes) still get one reply.
    await trx.raw("select pg_advisory_xact_lock(hashtext(?))", [`unmatched-sms:${text.from}`]);
    const id = await insertUnmatched(trx, { companyId: company.companyId, sender: text.from, body: text.body.trim(), mediaCount: text.media.length, messageSid: text.messageSid });
    if (id === undefined) return [];
    return (await unmatchedRecently(trx, text.from, id, UNMATCHED_REPLY_HOURS)) ? [] : [reply];
  });
}

/**
 * Handles one inbound text and returns the reply texts (possibly none). Keywords come first,
 * whoever sends them. Other texts from a customer become a question on their current plan;
 * from a customer with no active plan, or from a number we don't know, they are kept as
 * unmatched for managers, with a reply that says how to reach the office.
 */
export async function handleInboundText(deps: InboundDeps, text: InboundText): Promise<string[]> {
  const keyword = keywordOf(text.body);
  if (keyword) return handleKeyword(deps.db, text.from, keyword);
  if (!text.body.trim() && text.media.length === 0) return [];
  if (text.messageSid && (await textAlreadyFiled(deps.db, text.messageSid))) return [];

  const texter = await findTexter(deps.db, text.from);
  if (!texter) {
    const company = await fallbackCompany(deps.db);
    return keepUnmatched(deps.db, text, company, replies.unknownNumber(company.senderName, company.companyName, company.companyPhone));
  }
  const planId = await currentPlanId(deps.db, texter.customerId);
  if (planId === undefined) {
    return keepUnmatched(deps.db, text, texter, replies.noActivePlan(texter.senderName, texter.companyPhone));
  }
  const filed = await fileTextedQuestion(deps, texter, planId, text);
  if (filed.refused.length > 0) return [replies.photoRefused(texter.senderName, filed.stored, filed.refused)];
  return filed.stored ? [replies.received(texter.senderName, filed.photos)] : [];
}
