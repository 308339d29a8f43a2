import type { Knex } from "knex";
import { defaultProgramSettings } from "../shared/engine/index.ts";
import { addDays } from "../shared/engine/index.ts";
import { createPlanForVisit } from "../server/features/plans/service.ts";
import { insertVisit } from "../server/features/visits/repo.ts";
import { localDateAt } from "../server/lib/local-date.ts";
import { demoCompany, demoCustomers, demoTown, demoVisits } from "./data/demo-company.ts";

/**
 * The company's first care-program version and recent visits with their care plans.
 * A visit already seeded (same import key) is left alone, so running twice adds nothing.
 */
export async function seed(knex: Knex): Promise<void> {
  const company = await knex("companies").where({ slug: demoCompany.slug }).first<{ id: number }>("id");
  const { version: _v, ...settings } = defaultProgramSettings;
  await knex("program_settings")
    .insert({ company_id: company.id, version: 1, settings: JSON.stringify(settings) })
    .onConflict(["company_id", "version"])
    .ignore();

  const today = localDateAt(demoTown.time_zone);
  for (const v of demoVisits) {
    const importKey = `demo:${v.ref}:recent`;
    if (await knex("service_visits").where({ import_key: importKey }).first("id")) continue;
    const customer = demoCustomers.find((c) => c.ref === v.ref)!;
    const property = await knex("properties")
      .join("customers", "customers.id", "properties.customer_id")
      .where({ "customers.external_ref": customer.ref, "customers.company_id": company.id })
      .first<{ id: number; lawn: Record<string, unknown> }>("properties.id", "properties.lawn");
    const technician = await knex("users").where({ email: v.technician }).first<{ id: number }>("id");
    const date = addDays(today, -v.daysAgo);
    await knex.transaction(async (trx) => {
      await trx("properties")
        .where({ id: property.id })
        .update({ lawn: JSON.stringify({ ...property.lawn, expectedFirstFrost: addDays(date, v.frostAfterDays) }) });
      const visitId = await insertVisit(trx, {
        propertyId: property.id,
        technicianId: technician.id,
        date,
        services: v.services,
        details: { seedMix: [...v.seedMix], ...("seedRateLbPer1000" in v ? { seedRateLbPer1000: v.seedRateLbPer1000 } : {}), areaFt2: customer.lawnAreaFt2, products: [...v.products] },
        importKey,
      });
      // The demo's visits were booked ahead: each plan was made before its first step, prep steps included.
      await createPlanForVisit(trx, visitId, undefined, { bookedAhead: true });
    });
  }
}
