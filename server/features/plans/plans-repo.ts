import type { Plan, PlanInputRaw } from "#shared/engine/index";
import type { PlanHeader } from "#shared/schemas/plans";
import type { Db } from "../../db.ts";

type HeaderRow = {
  id: number;
  property_id: number;
  label: string;
  street: string;
  time_zone: string;
  visit_id: number;
  visit_date: string;
  services: string[];
  program_version: number;
  status: PlanHeader["status"];
  done: string;
  skipped: string;
  total: string;
};

export type PlanRow = HeaderRow & {
  company_id: number;
  customer_id: number;
  observations: unknown[];
  hold_offs: Plan["holdOffs"];
  /** Rows stored before warnings had an audience lack it. */
  warnings: (Omit<Plan["warnings"][number], "audience"> & { audience?: Plan["warnings"][number]["audience"] })[];
  figures: { summary: Plan["summary"]; meta: Plan["meta"]; cautions: Plan["cautions"] };
};

export const toHeader = (r: HeaderRow): PlanHeader => ({
  id: r.id,
  propertyId: r.property_id,
  propertyLabel: r.label,
  street: r.street,
  timeZone: r.time_zone,
  visitId: r.visit_id,
  visitDate: r.visit_date,
  services: r.services,
  programVersion: r.program_version,
  status: r.status,
  progress: { done: Number(r.done), skipped: Number(r.skipped), total: Number(r.total) },
});

export function headerQuery(db: Db) {
  return db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .join("service_visits", "service_visits.id", "care_plans.visit_id")
    // Lateral, so progress is counted for the plans asked for only, through the (plan_id, date) index.
    .joinRaw(
      `cross join lateral (
         select count(*) filter (where state = 'done') as done,
                count(*) filter (where state = 'skipped') as skipped,
                count(*) as total
         from plan_steps where plan_steps.plan_id = care_plans.id
       ) as progress`,
    )
    .select(
      "care_plans.id",
      "care_plans.property_id",
      "properties.label",
      "properties.street",
      "properties.time_zone",
      "care_plans.visit_id",
      "service_visits.visit_date",
      "service_visits.services",
      "care_plans.program_version",
      "care_plans.status",
      "progress.done",
      "progress.skipped",
      "progress.total",
    );
}

export async function plansOfCustomer(db: Db, customerId: number): Promise<PlanHeader[]> {
  const rows = await headerQuery(db)
    .where("customers.id", customerId)
    .orderBy([{ column: "service_visits.visit_date", order: "desc" }, { column: "care_plans.id", order: "desc" }]);
  return (rows as HeaderRow[]).map(toHeader);
}

export async function loadPlanRow(db: Db, planId: number): Promise<PlanRow | undefined> {
  return (await headerQuery(db)
    .select("customers.company_id", "customers.id as customer_id", "care_plans.hold_offs", "care_plans.warnings", "care_plans.figures")
    .where("care_plans.id", planId)
    .first()) as PlanRow | undefined;
}

export async function insertPlan(
  trx: Db,
  row: { propertyId: number; visitId: number; input: PlanInputRaw; plan: Plan },
): Promise<number> {
  const [created] = await trx("care_plans")
    .insert({
      property_id: row.propertyId,
      visit_id: row.visitId,
      program_version: row.plan.meta.programVersion,
      ...planColumns(row.input, row.plan),
    })
    .returning<{ id: number }[]>("id");
  return created!.id;
}

export async function updatePlan(trx: Db, planId: number, input: PlanInputRaw, plan: Plan, observations: unknown[]) {
  await trx("care_plans")
    .where({ id: planId })
    .update({ ...planColumns(input, plan), observations: JSON.stringify(observations), generated_at: trx.fn.now() });
}

function planColumns(input: PlanInputRaw, plan: Plan) {
  return {
    input: JSON.stringify(input),
    hold_offs: JSON.stringify(plan.holdOffs),
    warnings: JSON.stringify(plan.warnings),
    figures: JSON.stringify({ summary: plan.summary, meta: plan.meta, cautions: plan.cautions }),
  };
}

export async function planIdOfVisit(db: Db, visitId: number): Promise<number | undefined> {
  const row = await db("care_plans").where({ visit_id: visitId }).first<{ id: number } | undefined>("id");
  return row?.id;
}
