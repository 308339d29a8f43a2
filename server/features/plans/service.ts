import { generatePlan, homeownerWarnings, parsePlanInput, recomputePlan, type Observation, type PlaceRules, type Plan, type PlanInputRaw, type ProgramSettings } from "#shared/engine/index";
import type { StoredPlan, TodayResponse } from "#shared/schemas/plans";
import type { Db } from "../../db.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { loadVisitWithProperty, type VisitWithProperty } from "../visits/repo.ts";
import { placeOfProperty } from "../place-rules/repo.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import { currentProgram, programVersion } from "./program-repo.ts";
import * as plans from "./plans-repo.ts";
import type { PlanRow } from "./plans-repo.ts";
import * as steps from "./steps-repo.ts";
import { loadToday } from "./today-repo.ts";
import { maySee } from "./access.ts";

/** Runs after every change to a plan's steps, inside the same transaction (e.g. to reschedule reminders). */
export type PlanChangeHook = (trx: Db, planId: number) => Promise<void>;

export function engineInput(visit: VisitWithProperty, program: ProgramSettings, options: PlanInputRaw["options"] = {}, placeRules?: PlaceRules): PlanInputRaw {
  return {
    visit: { date: visit.visitDate, services: visit.services, ...visit.details } as PlanInputRaw["visit"],
    property: { ...visit.lawn, timeZone: visit.timeZone } as PlanInputRaw["property"],
    program,
    options,
    ...(placeRules ? { placeRules } : {}),
  };
}

/** The rules of the lawn's place as they are now: a regenerated plan follows today's rules. */
function placeRulesOf(db: Db, visit: VisitWithProperty): Promise<PlaceRules | undefined> {
  return placeOfProperty(db, visit.companyId, visit.region, visit.postalCode);
}

/** Validates an input assembled from stored records; a failure means the records need fixing, not the user's form. */
function parseStored(raw: PlanInputRaw) {
  const parsed = parsePlanInput(raw);
  if (!parsed.ok) {
    throw new HttpError(422, "plan_input_invalid", "The visit or property details can't make a care plan yet. Fix the fields listed.", parsed.fields);
  }
  return parsed.value;
}

/**
 * Creates the care plan of a visit and all its steps; call inside the visit's transaction.
 * The plan starts on the day it is made (today in the lawn's zone), so a visit logged today or
 * imported from the past has no step born missed. `bookedAhead` is only for demo data that plays
 * back a season: plans made when their visit was booked, before any of their steps, prep included.
 */
export async function createPlanForVisit(
  trx: Db,
  visitId: number,
  onChange?: PlanChangeHook,
  options: { bookedAhead?: boolean } = {},
): Promise<{ planId: number; plan: Plan }> {
  const visit = await loadVisitWithProperty(trx, visitId);
  if (!visit) throw notFound("That visit");
  const program = await currentProgram(trx, visit.companyId);
  const placeRules = await placeRulesOf(trx, visit);
  const raw = engineInput(visit, program, options.bookedAhead ? {} : { today: localDateAt(visit.timeZone) }, placeRules);
  const plan = generatePlan(parseStored(raw));
  const planId = await plans.insertPlan(trx, { propertyId: visit.propertyId, visitId, input: raw, plan });
  await steps.syncSteps(trx, planId, [...plan.prepSteps, ...plan.steps]);
  await onChange?.(trx, planId);
  return { planId, plan };
}

/**
 * Recomputes a plan from its visit as it is now (date moved, observations added), keeping
 * the program version it was made from and every step already done or skipped. The same
 * call twice leaves the same rows.
 */
export async function regeneratePlan(db: Db, planId: number, change: { observation?: Observation } = {}, onChange?: PlanChangeHook): Promise<void> {
  await db.transaction(async (trx) => {
    // Serialises concurrent regenerations of one plan across server processes.
    const locked = await trx("care_plans").where({ id: planId }).forUpdate().first<{ visit_id: number; program_version: number; observations: Observation[] } | undefined>("visit_id", "program_version", "observations");
    if (!locked) throw notFound("That care plan");
    const visit = await loadVisitWithProperty(trx, locked.visit_id);
    if (!visit) throw notFound("That visit");
    const program = (await programVersion(trx, visit.companyId, locked.program_version)) ?? (await currentProgram(trx, visit.companyId));
    const observations = change.observation ? [...locked.observations, change.observation] : locked.observations;
    const today = localDateAt(visit.timeZone);
    const raw = engineInput(visit, program, { today, observations }, await placeRulesOf(trx, visit));
    const input = parseStored(raw);
    const previous = (await steps.stepsOfPlan(trx, planId)).map(steps.toEngineStep);
    const plan = recomputePlan({ steps: previous.filter((s) => s.phase !== "prep"), prepSteps: previous.filter((s) => s.phase === "prep") }, input, today);
    await plans.updatePlan(trx, planId, raw, plan, observations);
    await steps.syncSteps(trx, planId, [...plan.prepSteps, ...plan.steps]);
    await onChange?.(trx, planId);
  });
}

/**
 * The warnings a reader is sent: a customer only the homeowner ones, staff all of them. Warnings
 * stored before audiences existed have none, so they reach staff only (as crew warnings).
 */
function warningsFor(reader: SessionUser | undefined, stored: PlanRow["warnings"]): StoredPlan["warnings"] {
  if (reader?.role === "customer") return homeownerWarnings(stored).map((w) => ({ ...w, audience: "homeowner" }));
  return stored.map((w) => ({ ...w, audience: w.audience ?? "crew" }));
}

/** The whole plan; with `reader`, only if they may see it (checked on the row it loads anyway). */
export async function loadStoredPlan(db: Db, planId: number, reader?: SessionUser): Promise<StoredPlan> {
  const row = await plans.loadPlanRow(db, planId);
  if (!row || (reader && !maySee(reader, row))) throw notFound("That care plan");
  const stepRows = await steps.stepsOfPlan(db, planId);
  const { meta, summary, cautions } = row.figures;
  return {
    ...plans.toHeader(row),
    phases: meta.phases.map((p) => ({ ...p })),
    firstMowDate: meta.firstMowDate,
    holdOffs: row.hold_offs.map((h) => ({ ...h, cautions: [...h.cautions] })),
    warnings: warningsFor(reader, row.warnings),
    cautions: cautions.map((c) => ({ ...c })),
    figures: summary as unknown as Record<string, unknown>,
    steps: stepRows.map(steps.toStoredStep),
  };
}

/**
 * Today's steps, active hold-offs and the next milestone, in the lawn's own time zone.
 * The homeowner's most frequent request: one query, which also decides access.
 */
export async function todayView(db: Db, user: SessionUser, planId: number, now = new Date()): Promise<TodayResponse> {
  const row = await loadToday(db, planId, now);
  if (!row || !maySee(user, row)) throw notFound("That care plan");
  const { today } = row;
  return {
    today,
    plan: plans.toHeader(row),
    steps: row.steps.map(steps.toStoredStep),
    activeHoldOffs: row.hold_offs.filter((h) => h.start <= today && today <= h.end).map((h) => ({ ...h, cautions: [...h.cautions] })),
    nextMilestone: row.next_milestone,
    warnings: warningsFor(user, row.warnings),
    cautions: row.cautions.map((c) => ({ ...c })),
  };
}
