import type { Db } from "../../../db.ts";

/**
 * Inserts a visit, a care plan and chosen steps for a seeded customer, straight into the
 * tables (the plans feature makes real ones from the engine; these tests need only rows).
 */
export type FixtureStep = {
  key: string;
  date: string;
  kind: string;
  title: string;
  phase?: string;
  content?: Record<string, unknown>;
  state?: "pending" | "done" | "skipped";
};

export type FixtureHoldOff = { kind: string; start: string; end: string; source?: string; provenance?: "published" | "common practice" | "from memory" };

export async function customerByRef(db: Db, externalRef: string) {
  const row = await db("customers")
    .join("properties", "properties.customer_id", "customers.id")
    .where("customers.external_ref", externalRef)
    .first<{ customer_id: number; user_id: number; property_id: number; time_zone: string }>(
      "customers.id as customer_id", "customers.user_id", "properties.id as property_id", "properties.time_zone",
    );
  if (!row) throw new Error(`no seeded customer ${externalRef}`);
  return { customerId: row.customer_id, userId: row.user_id, propertyId: row.property_id, timeZone: row.time_zone };
}

export async function createPlanFixture(
  db: Db,
  options: { customerRef: string; visitDate?: string; steps?: FixtureStep[]; holdOffs?: FixtureHoldOff[] },
): Promise<{ planId: number; propertyId: number; customerId: number }> {
  const owner = await customerByRef(db, options.customerRef);
  return db.transaction(async (trx) => {
    const [visit] = await trx("service_visits")
      .insert({ property_id: owner.propertyId, visit_date: options.visitDate ?? "2026-09-15", services: ["overseeding", "aeration"], details: {} })
      .returning<{ id: number }[]>("id");
    const holdOffs = (options.holdOffs ?? []).map((h) => ({
      why: "New seedlings are hurt by weed killers until they have been mowed a few times.",
      source: "test fixture", provenance: "common practice", cautions: [], ...h,
    }));
    const [plan] = await trx("care_plans")
      .insert({ property_id: owner.propertyId, visit_id: visit!.id, program_version: 1, input: {}, hold_offs: JSON.stringify(holdOffs) })
      .returning<{ id: number }[]>("id");
    for (const step of options.steps ?? []) {
      await trx("plan_steps").insert({
        plan_id: plan!.id, key: step.key, date: step.date, phase: step.phase ?? "germination", kind: step.kind, title: step.title,
        content: JSON.stringify({ detail: `${step.title} (detail)`, why: { text: "Seed must stay moist to germinate.", source: "test", provenance: "common practice" }, cautions: [], ...step.content }),
        state: step.state ?? "pending",
      });
    }
    return { planId: plan!.id, propertyId: owner.propertyId, customerId: owner.customerId };
  });
}
