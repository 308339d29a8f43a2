import type { Db } from "../../../db.ts";
import { insertVisit } from "../../visits/repo.ts";

/**
 * A company of its own for one test file, so the demo company's seeded season does not
 * change the numbers a test works out by hand. Staff sign in through the fake Google
 * provider, which accepts any address.
 */
export async function createIsolatedCompany(db: Db, slug: string, staff: { email: string; role: "technician" | "manager"; name: string }[]) {
  const [company] = await db("companies")
    .insert({ slug, name: `Isolated ${slug}`, time_zone: "America/New_York", sms_sender_name: "Isolated" })
    .returning<{ id: number }[]>("id");
  const ids: Record<string, number> = {};
  for (const person of staff) {
    const [user] = await db("users").insert({ company_id: company!.id, ...person }).returning<{ id: number }[]>("id");
    ids[person.email] = user!.id;
  }
  return { companyId: company!.id, staffIds: ids };
}

export const coolSeasonLawn = {
  grassType: { species: ["tall_fescue"] },
  lawnCondition: "thin",
  irrigation: { kind: "in_ground", zones: 2, precipitationRateInPerHour: 1.5 },
  currentMowingHeightIn: 3.5,
  mowerHighestSettingIn: 4,
  expectedFirstFrost: "2026-11-15",
};

let counter = 0;

/** A homeowner with one lawn in the company. */
export async function createCustomer(db: Db, companyId: number, name: { first: string; last: string; email?: string; phone?: string; street?: string; ref?: string }) {
  counter += 1;
  const email = name.email ?? `${name.first.toLowerCase()}.${name.last.toLowerCase()}.${companyId}.${counter}@mail.example`;
  const [user] = await db("users")
    .insert({ company_id: companyId, role: "customer", name: `${name.first} ${name.last}`, email, phone: name.phone ?? null })
    .returning<{ id: number }[]>("id");
  const [customer] = await db("customers")
    .insert({ company_id: companyId, user_id: user!.id, first_name: name.first, last_name: name.last, external_ref: name.ref ?? null })
    .returning<{ id: number }[]>("id");
  const [property] = await db("properties")
    .insert({
      customer_id: customer!.id, street: name.street ?? `${counter} Test Lane`, town: "Wrenmoor", region: "OH", postal_code: "44990",
      time_zone: "America/New_York", lawn_area_ft2: 5000, lawn: JSON.stringify(coolSeasonLawn),
    })
    .returning<{ id: number }[]>("id");
  return { userId: user!.id, customerId: customer!.id, propertyId: property!.id, email };
}

/** A visit with no generated plan, for tests that build their plans' steps by hand. */
export async function createVisit(db: Db, propertyId: number, technicianId: number | null, date: string, services: string[]) {
  return insertVisit(db, { propertyId, technicianId, date, services, details: { areaFt2: 5000 } });
}

/**
 * A care plan row with exactly the steps given (date and state), instead of the engine's
 * sixty-odd, so shares of done steps can be worked out by hand.
 */
export async function createHandMadePlan(db: Db, propertyId: number, visitId: number, steps: { date: string; state: "pending" | "done" | "skipped" }[]) {
  const [plan] = await db("care_plans").insert({ property_id: propertyId, visit_id: visitId, program_version: 1, input: "{}" }).returning<{ id: number }[]>("id");
  if (steps.length) {
    await db("plan_steps").insert(
      steps.map((s, i) => ({ plan_id: plan!.id, key: `hand-${i}`, date: s.date, phase: "germination", kind: "water", title: "Water", content: "{}", state: s.state })),
    );
  }
  return plan!.id;
}
