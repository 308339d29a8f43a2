import type { Knex } from "knex";
import { demoCompany, demoCustomers, demoStaff, demoTown } from "./data/demo-company.ts";

/** The invented company, its staff and customers. Upserts, so running it twice changes nothing. */
export async function seed(knex: Knex): Promise<void> {
  await knex.transaction(async (trx) => {
    const [company] = await trx("companies")
      .insert(demoCompany)
      .onConflict("slug")
      .merge()
      .returning<{ id: number }[]>("id");
    const companyId = company!.id;

    for (const person of demoStaff) {
      await trx("users")
        .insert({ company_id: companyId, ...person })
        .onConflict("email")
        .merge(["name", "role", "phone"]);
    }

    for (const c of demoCustomers) {
      const [user] = await trx("users")
        .insert({
          company_id: companyId,
          role: "customer",
          name: `${c.firstName} ${c.lastName}`,
          email: c.email,
          phone: c.phone,
        })
        .onConflict(c.email ? "email" : "phone")
        .merge(["name"])
        .returning<{ id: number }[]>("id");
      const [customer] = await trx("customers")
        .insert({ company_id: companyId, user_id: user!.id, first_name: c.firstName, last_name: c.lastName, external_ref: c.ref })
        .onConflict(["company_id", "external_ref"])
        .merge(["first_name", "last_name"])
        .returning<{ id: number }[]>("id");
      await trx("properties")
        .insert({
          customer_id: customer!.id,
          label: "Home",
          street: c.street,
          town: demoTown.town,
          region: demoTown.region,
          postal_code: c.postalCode,
          time_zone: demoTown.time_zone,
          lawn_area_ft2: c.lawnAreaFt2,
          lawn: JSON.stringify(c.lawn),
        })
        .onConflict(["customer_id", "label"])
        // The lawn facts follow the current seed data; the frost date set by a later seed is kept.
        .merge({
          street: c.street,
          lawn_area_ft2: c.lawnAreaFt2,
          lawn: trx.raw("excluded.lawn || jsonb_strip_nulls(jsonb_build_object('expectedFirstFrost', properties.lawn -> 'expectedFirstFrost'))"),
        });
    }
  });
}
