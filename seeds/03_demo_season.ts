import type { Knex } from "knex";
import { addDays } from "../shared/engine/index.ts";
import { createPlanForVisit } from "../server/features/plans/service.ts";
import { insertVisit } from "../server/features/visits/repo.ts";
import { demoCompany, demoTown } from "./data/demo-company.ts";
import { seasonFollowUps, seasonFrostDate, seasonSavedReplies, seasonVisits, type SeasonVisit } from "./data/demo-season.ts";

/**
 * A season of invented history for the callback report: earlier seeding visits with their
 * care plans (some steps done or skipped, so adherence differs), follow-up visits and
 * callbacks, and saved replies. Visits are keyed by import key and follow-ups by plan and
 * reason, so running the seed twice adds nothing.
 */
export async function seed(knex: Knex): Promise<void> {
  const company = await knex("companies").where({ slug: demoCompany.slug }).first<{ id: number }>("id");
  const staff = new Map(
    (await knex("users").where({ company_id: company.id }).whereIn("role", ["technician", "manager"]).select<{ id: number; email: string }[]>("id", "email")).map((u) => [u.email, u.id]),
  );
  const manager = staff.get("dana@cobblefield.example") ?? null;

  const planOfRef = new Map<string, { planId: number; propertyId: number; visitDate: string }>();
  for (const v of seasonVisits) {
    planOfRef.set(v.ref, await seedVisit(knex, company.id, staff.get(v.technician) ?? null, v));
  }

  for (const f of seasonFollowUps) {
    const origin = planOfRef.get(f.ref)!;
    const exists = await knex("follow_up_visits").where({ plan_id: origin.planId, reason: f.reason }).first("id");
    if (exists) continue;
    await knex("follow_up_visits").insert({
      property_id: origin.propertyId,
      plan_id: origin.planId,
      status: f.status,
      scheduled_for: f.scheduledAfterDays === null ? null : addDays(origin.visitDate, f.scheduledAfterDays),
      technician_id: f.technician ? (staff.get(f.technician) ?? null) : null,
      reason: f.reason,
      reason_note: f.reasonNote,
      is_callback: f.isCallback,
      labour_hours: f.labourHours,
      materials_cost: f.materialsCost,
      outcome: f.outcome,
      outcome_note: f.outcomeNote,
      created_by: manager,
      // Booked in the afternoon, local time, the given number of days after the visit.
      created_at: `${addDays(origin.visitDate, f.bookedAfterDays)}T19:00:00Z`,
      updated_at: `${addDays(origin.visitDate, f.scheduledAfterDays ?? f.bookedAfterDays)}T21:00:00Z`,
    });
  }

  for (const reply of seasonSavedReplies) {
    await knex("saved_replies")
      .insert({ company_id: company.id, title: reply.title, body: reply.body, created_by: manager })
      .onConflict(["company_id", "title"])
      .merge(["body"]);
  }
}

async function seedVisit(knex: Knex, companyId: number, technicianId: number | null, v: SeasonVisit) {
  return knex.transaction(async (trx) => {
    const [user] = await trx("users")
      .insert({ company_id: companyId, role: "customer", name: `${v.firstName} ${v.lastName}`, email: v.email, phone: v.phone })
      .onConflict("email")
      .merge(["name"])
      .returning<{ id: number }[]>("id");
    const [customer] = await trx("customers")
      .insert({ company_id: companyId, user_id: user!.id, first_name: v.firstName, last_name: v.lastName, external_ref: v.ref })
      .onConflict(["company_id", "external_ref"])
      .merge(["first_name", "last_name"])
      .returning<{ id: number }[]>("id");
    const lawn = {
      grassType: { species: ["tall_fescue", "kentucky_bluegrass"] },
      lawnCondition: v.services.includes("new_seeding") ? "bare" : "thin",
      irrigation: v.irrigation === "in_ground" ? { kind: "in_ground", zones: 4, precipitationRateInPerHour: 1.2 } : { kind: v.irrigation },
      currentMowingHeightIn: 3.5,
      mowerHighestSettingIn: 4,
      mowerSettingStepIn: 0.5,
      expectedFirstFrost: seasonFrostDate,
    };
    const [property] = await trx("properties")
      .insert({
        customer_id: customer!.id, label: "Home", street: v.street, town: demoTown.town, region: demoTown.region,
        postal_code: v.postalCode, time_zone: demoTown.time_zone, lawn_area_ft2: v.lawnAreaFt2, lawn: JSON.stringify(lawn),
      })
      .onConflict(["customer_id", "label"])
      .merge(["street"])
      .returning<{ id: number }[]>("id");

    const importKey = `demo-season:${v.ref}`;
    const known = await trx("service_visits").join("care_plans", "care_plans.visit_id", "service_visits.id").where({ import_key: importKey }).first<{ plan_id: number } | undefined>("care_plans.id as plan_id");
    if (known) return { planId: known.plan_id, propertyId: property!.id, visitDate: v.date };

    const visitId = await insertVisit(trx, {
      propertyId: property!.id,
      technicianId,
      date: v.date,
      services: v.services,
      details: { seedMix: v.seedMix, seedRateLbPer1000: v.seedRateLbPer1000, areaFt2: v.lawnAreaFt2, products: v.products },
      importKey,
    });
    // The season's visits were booked ahead: each plan was made before its first step, prep steps included.
    const { planId } = await createPlanForVisit(trx, visitId, undefined, { bookedAhead: true });
    await tickOffSteps(trx, planId, user!.id, v.adherence);
    return { planId, propertyId: property!.id, visitDate: v.date };
  });
}

/**
 * The homeowner's record on the plan: the given share of the steps already due is done, and
 * of the rest every other one skipped (the others were simply left), in date order.
 */
async function tickOffSteps(trx: Knex, planId: number, customerUserId: number, adherence: number) {
  const today = new Date().toISOString().slice(0, 10);
  const due = await trx("plan_steps").where({ plan_id: planId }).andWhere("date", "<=", today).orderBy(["date", "id"]).select<{ id: string; date: string }[]>("id", "date");
  // Spread the done steps through the plan rather than bunching them at the start.
  const doneIds: string[] = [];
  const skippedIds: string[] = [];
  due.forEach((step, i) => {
    const done = Math.floor((i + 1) * adherence) > Math.floor(i * adherence);
    if (done) doneIds.push(step.id);
    else if (i % 2 === 0) skippedIds.push(step.id);
  });
  const at = (ids: string[]) => trx("plan_steps").whereIn("id", ids);
  if (doneIds.length) await at(doneIds).update({ state: "done", state_changed_by: customerUserId, state_changed_at: trx.raw("(date + time '19:30') at time zone 'America/New_York'") });
  if (skippedIds.length) await at(skippedIds).update({ state: "skipped", state_changed_by: customerUserId, state_changed_at: trx.raw("(date + time '20:00') at time zone 'America/New_York'"), skip_reason: "Away that day" });
}
