import { fillPlaceholders, type SavedReplyInput, type SavedReplyPlaceholder } from "#shared/schemas/saved-replies";
import type { SessionUser } from "../../auth/session-user.ts";
import type { Db } from "../../db.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { findPlanForUser } from "../plans/access.ts";
import * as repo from "./repo.ts";

const weekdays = ["Sunday", "Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday"];
const months = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** "Tuesday, September 8": a plan date as a homeowner reads it, the same on every server locale. */
export function spokenDate(isoDate: string): string {
  const [y, m, d] = isoDate.split("-").map(Number) as [number, number, number];
  const weekday = new Date(Date.UTC(y, m - 1, d)).getUTCDay();
  return `${weekdays[weekday]}, ${months[m - 1]} ${d}`;
}

/** Read where a date is not known yet (e.g. a plan without a mowing step). */
export const NO_DATE_YET = "(date to be confirmed)";

const duplicateTitle = (err: unknown) =>
  (err as { code?: string }).code === "23505"
    ? new HttpError(409, "duplicate_title", "A saved reply with this title already exists.", { title: "Pick another title" })
    : err;

export async function createReply(db: Db, user: SessionUser, input: SavedReplyInput) {
  const id = await repo.insertReply(db, { companyId: user.companyId, ...input, createdBy: user.id }).catch((err) => Promise.reject(duplicateTitle(err)));
  return (await repo.findReply(db, user.companyId, id))!;
}

export async function updateReply(db: Db, user: SessionUser, id: number, input: SavedReplyInput) {
  const found = await repo.updateReply(db, user.companyId, id, input).catch((err) => Promise.reject(duplicateTitle(err)));
  if (!found) throw notFound("That saved reply");
  return (await repo.findReply(db, user.companyId, id))!;
}

/** The reply's text for one customer's plan; a reply or plan of another company is "not found". */
export async function renderReply(db: Db, user: SessionUser, replyId: number, planId: number): Promise<{ text: string; missing: SavedReplyPlaceholder[] }> {
  const reply = await repo.findReply(db, user.companyId, replyId);
  if (!reply) throw notFound("That saved reply");
  await findPlanForUser(db, user, planId);
  const facts = (await repo.planFacts(db, planId))!;
  const missing: SavedReplyPlaceholder[] = facts.first_mow_date ? [] : ["firstMowDate"];
  const text = fillPlaceholders(reply.body, {
    firstName: facts.first_name,
    visitDate: spokenDate(facts.visit_date),
    firstMowDate: facts.first_mow_date ? spokenDate(facts.first_mow_date) : NO_DATE_YET,
    companyName: facts.company_name,
  });
  return { text, missing };
}
