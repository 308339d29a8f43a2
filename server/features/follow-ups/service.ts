import { followUpTransitions, type CreateFollowUp, type FollowUp, type UpdateFollowUp } from "#shared/schemas/follow-ups";
import type { SessionUser } from "../../auth/session-user.ts";
import type { Db } from "../../db.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { findInCompany } from "../properties/repo.ts";
import { announceVisit, visitChange } from "./announce.ts";
import * as repo from "./repo.ts";

const invalid = (fields: Record<string, string>) => new HttpError(400, "invalid_input", "Some of the information is not valid.", fields);

async function checkTechnician(db: Db, companyId: number, technicianId: number | null | undefined) {
  if (technicianId == null) return;
  if (!(await repo.isActiveStaff(db, companyId, technicianId))) {
    throw invalid({ technicianId: "Pick an active technician or manager of your company" });
  }
}

/** An arrival window is both ends or neither, and ends after it starts ("HH:MM" compares as text). */
export function checkWindow(start: string | null | undefined, end: string | null | undefined): Record<string, string> {
  if ((start ?? null) === null && (end ?? null) === null) return {};
  if (!start) return { arrivalStart: "Give the start of the arrival window" };
  if (!end) return { arrivalEnd: "Give the end of the arrival window" };
  return end > start ? {} : { arrivalEnd: "The window must end after it starts" };
}

/**
 * Books a follow-up visit on a lawn, from a question or from a plan. With a date and a
 * technician it is scheduled straight away; otherwise it waits as requested.
 */
export async function createFollowUp(db: Db, user: SessionUser, body: CreateFollowUp): Promise<FollowUp> {
  const property = await findInCompany(db, user.companyId, body.propertyId);
  if (!property) throw notFound("That property");

  let planId = body.planId ?? null;
  if (body.questionMessageId !== undefined) {
    const questionPlan = await repo.planOfQuestion(db, user.companyId, body.questionMessageId);
    if (questionPlan === undefined) throw notFound("That question");
    if (questionPlan !== null) {
      if (planId !== null && planId !== questionPlan) throw invalid({ planId: "The question was asked on another care plan" });
      planId = questionPlan;
    }
  }
  if (planId !== null && !(await repo.planOfProperty(db, planId, property.id))) {
    throw invalid({ planId: "That care plan is not of this property" });
  }
  await checkTechnician(db, user.companyId, body.technicianId);
  const windowFields = checkWindow(body.arrivalStart, body.arrivalEnd);
  if (Object.keys(windowFields).length) throw invalid(windowFields);

  const scheduled = body.scheduledFor !== undefined && body.technicianId !== undefined;
  const id = await db.transaction(async (trx) => {
    const newId = await repo.insertFollowUp(trx, {
      property_id: property.id,
      plan_id: planId,
      question_message_id: body.questionMessageId ?? null,
      status: scheduled ? "scheduled" : "requested",
      scheduled_for: body.scheduledFor ?? null,
      technician_id: body.technicianId ?? null,
      reason: body.reason,
      reason_note: body.reasonNote ?? null,
      is_callback: body.isCallback ?? false,
      created_by: user.id,
      arrival_start: body.arrivalStart ?? null,
      arrival_end: body.arrivalEnd ?? null,
      customer_prep: body.customerPrep || null,
    });
    const after = { status: scheduled ? "scheduled" : "requested", scheduledFor: body.scheduledFor ?? null, arrivalStart: body.arrivalStart ?? null, arrivalEnd: body.arrivalEnd ?? null } as const;
    await announceVisit(trx, { id: newId, planId, propertyId: property.id }, visitChange(null, after));
    return newId;
  });
  return (await repo.findFollowUp(db, user.companyId, id))!;
}

const costFields = ["labourHours", "materialsCost", "outcome", "outcomeNote"] as const;

/** The follow-up as it would be after the patch; undefined fields keep their value. */
function merge(current: FollowUp, patch: UpdateFollowUp): FollowUp {
  const next = { ...current };
  for (const [key, value] of Object.entries(patch)) {
    if (value !== undefined) (next as Record<string, unknown>)[key] = value;
  }
  return next;
}

/**
 * The rules of a change, checked against the follow-up as it is and as it would be.
 * Returns the field errors; a wrong status step or a forbidden edit throws instead.
 */
export function checkChange(current: FollowUp, patch: UpdateFollowUp, role: SessionUser["role"]): Record<string, string> {
  if (patch.status !== undefined && patch.status !== current.status && !followUpTransitions[current.status].includes(patch.status)) {
    const allowed = followUpTransitions[current.status];
    throw new HttpError(
      409,
      "invalid_transition",
      allowed.length ? `A ${current.status} follow-up can only become ${allowed.join(" or ")}.` : `A ${current.status} follow-up cannot change status.`,
    );
  }
  const touched = Object.entries(patch).filter(([, v]) => v !== undefined).map(([k]) => k);
  if (current.status === "closed") {
    // Closed records feed the report; only a manager corrects them, and only their cost and outcome.
    const onlyCost = touched.every((k) => (costFields as readonly string[]).includes(k));
    if (role !== "manager" || !onlyCost) {
      throw new HttpError(409, "follow_up_closed", "This follow-up is closed. Only a manager can correct its cost and outcome.");
    }
  }
  if (role !== "manager") {
    // Technicians record the cost once, when they do the visit; changing a recorded cost is a manager's call.
    for (const key of ["labourHours", "materialsCost"] as const) {
      if (patch[key] !== undefined && current[key] !== null && patch[key] !== current[key]) {
        throw new HttpError(403, "manager_only", "Only a manager can change a cost that is already recorded.");
      }
    }
  }

  const next = merge(current, patch);
  const fields: Record<string, string> = {};
  if (!next.isCallback) {
    for (const key of costFields) {
      const value = patch[key];
      if (value !== undefined && value !== null && !(key === "outcome" && value === "pending")) {
        fields[key] = "Only a callback records a cost and an outcome";
      }
    }
  }
  if (next.status === "scheduled" || next.status === "done") {
    if (!next.scheduledFor) fields.scheduledFor = "Give the date of the visit";
    if (!next.technicianId) fields.technicianId = "Pick the technician who goes";
  }
  Object.assign(fields, checkWindow(next.arrivalStart, next.arrivalEnd));
  if (next.isCallback && next.status === "done" && next.labourHours === null) {
    fields.labourHours = "Record the labor hours of this callback";
  }
  if (next.isCallback && next.status === "closed" && next.outcome === "pending") {
    fields.outcome = "Record how the callback turned out before closing it";
  }
  return fields;
}

export async function updateFollowUp(db: Db, user: SessionUser, id: number, patch: UpdateFollowUp): Promise<FollowUp> {
  await db.transaction(async (trx) => {
    if (!(await repo.lockFollowUp(trx, user.companyId, id))) throw notFound("That follow-up");
    const current = (await repo.findFollowUp(trx, user.companyId, id))!;
    const fields = checkChange(current, patch, user.role);
    if (Object.keys(fields).length) throw invalid(fields);
    await checkTechnician(trx, user.companyId, patch.technicianId);

    const unCallback = patch.isCallback === false && current.isCallback;
    const next = merge(current, patch);
    const change = visitChange(current, next);
    await repo.updateFollowUp(trx, id, {
      status: patch.status,
      scheduled_for: patch.scheduledFor,
      technician_id: patch.technicianId,
      reason: patch.reason,
      reason_note: patch.reasonNote,
      is_callback: patch.isCallback,
      // No longer a callback: its cost and outcome would otherwise still count in the report.
      ...(unCallback
        ? { labour_hours: null, materials_cost: null, outcome: "pending", outcome_note: null }
        : { labour_hours: patch.labourHours, materials_cost: patch.materialsCost, outcome: patch.outcome, outcome_note: patch.outcomeNote }),
      arrival_start: patch.arrivalStart,
      arrival_end: patch.arrivalEnd,
      customer_prep: patch.customerPrep === "" ? null : patch.customerPrep,
      work_done: patch.workDone === "" ? null : patch.workDone,
      // A moved visit is a new appointment: the homeowner's earlier answer was about the old one.
      ...(change === "moved" ? { customer_response: null, customer_responded_at: null } : {}),
    });
    await announceVisit(trx, current, change);
  });
  return (await repo.findFollowUp(db, user.companyId, id))!;
}
