import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import Papa from "papaparse";
import { IMPORT_COLUMNS } from "#shared/schemas/visit-import";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { addDays } from "#shared/engine/index";
import { localDateAt } from "../../lib/local-date.ts";
import { createCustomer, createIsolatedCompany } from "../follow-ups/testing/isolated-company.ts";

type Agent = ReturnType<typeof request.agent>;
type Row = Record<string, string>;
let ctx: TestContext;
let boss: Agent;
let companyId: number;
let preExisting: { customerId: number; email: string };
const tag = Date.now();

beforeAll(async () => {
  ctx = await createTestContext();
  const made = await createIsolatedCompany(ctx.db, `import-${tag}`, [
    { email: `boss.${tag}@import.example`, role: "manager", name: "Imma Boss" },
    { email: `tech.${tag}@import.example`, role: "technician", name: "Ivo Tech" },
  ]);
  companyId = made.companyId;
  // Known to the company from a visit logged in the app: no customer number yet.
  const pre = await createCustomer(ctx.db, companyId, { first: "Pia", last: "Prior", street: "1 Pre Street" });
  preExisting = { customerId: pre.customerId, email: pre.email };
  boss = await signInStaff(ctx, `boss.${tag}@import.example`);
});
afterAll(async () => ctx.close());

const good = (overrides: Row = {}): Row => ({
  customer_ref: "R-1", first_name: "Una", last_name: "Umber", email: `una.${tag}@mail.example`, phone: "",
  street: "5 Import Road", town: "Wrenmoor", region: "OH", postal_code: "44990", time_zone: "",
  visit_date: "2026-09-08", services: "aeration;overseeding", seed_species: "tall_fescue", seed_percent: "", seed_purity_pct: "98",
  seed_germination_pct: "90", seed_rate_lb_per_1000: "5", area_ft2: "5,000", product_name: "", product_n: "", product_p: "", product_k: "",
  product_rate_lb_per_1000: "", grass_species: "tall_fescue", lawn_condition: "thin", irrigation: "in_ground", precipitation_rate_in_per_h: "1.5",
  mowing_height_in: "3.5", mower_highest_in: "4", expected_first_frost: "2026-10-24", technician_email: `tech.${tag}@import.example`, notes: "",
  ...overrides,
});

const toCsv = (rows: Row[]) => Papa.unparse({ fields: [...IMPORT_COLUMNS], data: rows.map((r) => IMPORT_COLUMNS.map((c) => r[c] ?? "")) });

/** Spreadsheet rows 2 … 12 of the day's file. */
const dayFile = toCsv([
  /* 2 */ good(),
  /* 3 */ good({ visit_date: "2026-09-20", services: "fertiliser_only", seed_species: "", seed_purity_pct: "", seed_germination_pct: "", seed_rate_lb_per_1000: "", product_name: "Autumn 24-0-12", product_n: "24", product_p: "0", product_k: "12", product_rate_lb_per_1000: "3" }),
  /* 4 */ good(),
  /* 5 */ good({ customer_ref: "R-2", email: "not-an-email", visit_date: "2026-13-40", services: "overseeding;moonwalking", seed_percent: "60;30" }),
  /* 6 */ good({ customer_ref: "R-3", first_name: "", email: `r3.${tag}@mail.example`, street: "", area_ft2: "lots" }),
  /* 7 */ good({ customer_ref: "R-4", email: `r4.${tag}@mail.example`, street: "7 Ghost Lane", technician_email: "ghost@import.example" }),
  /* 8 */ good({ customer_ref: "R-5", email: `r5.${tag}@mail.example`, street: "8 Tall Grass Court", mowing_height_in: "5", expected_first_frost: "2026-09-01" }),
  /* 9 */ good({ customer_ref: "R-6", first_name: "Seb", last_name: "Sixer", email: "", phone: "(330) 555-0177", street: "9 Phone Row" }),
  /* 10 */ good({ customer_ref: "R-7", first_name: "", last_name: "", email: "", phone: "", street: "1 pre street", grass_species: "", lawn_condition: "", irrigation: "", precipitation_rate_in_per_h: "", mowing_height_in: "", mower_highest_in: "", expected_first_frost: "" }),
  /* 11 */ good({ customer_ref: "R-8", email: "ruth.okonkwo@mail.example", street: "11 Borrowed Way" }),
]);
// Row 10 is matched to Pia by her e-mail address, so give it hers.
const dayFileWithPia = () => dayFile.replace(/^R-7,,,,/m, `R-7,,,${preExisting.email},`);

const upload = (agent: Agent, path: string, csv: string, name = "visits.csv") => agent.post(path).attach("file", Buffer.from(csv, "utf8"), { filename: name, contentType: "text/csv" });

async function counts() {
  const n = async (table: string, join: (q: ReturnType<TestContext["db"]>) => unknown) => {
    const q = ctx.db(table);
    join(q);
    return Number((await q.count<{ n: string }[]>({ n: "*" }))[0]!.n);
  };
  return {
    customers: await n("customers", (q) => q.where({ company_id: companyId })),
    properties: await n("properties", (q) => q.join("customers", "customers.id", "properties.customer_id").where("customers.company_id", companyId)),
    visits: await n("service_visits", (q) => q.join("properties", "properties.id", "service_visits.property_id").join("customers", "customers.id", "properties.customer_id").where("customers.company_id", companyId)),
    plans: await n("care_plans", (q) => q.join("properties", "properties.id", "care_plans.property_id").join("customers", "customers.id", "properties.customer_id").where("customers.company_id", companyId)),
  };
}

type PreviewRow = { row: number; ok: boolean; errors: Record<string, string>; customerAction: string | null; visitAction: string | null; visitKey: string | null; duplicateOfRow: number | null };
const byRow = (rows: PreviewRow[]) => Object.fromEntries(rows.map((r) => [r.row, r]));

describe("the template", () => {
  it("is a header of every documented column and one example row that passes the preview", async () => {
    const res = await boss.get("/api/visit-imports/template.csv").expect(200);
    expect(res.headers["content-disposition"]).toMatch(/^attachment/);
    const parsed = Papa.parse<Row>(res.text, { header: true, skipEmptyLines: true });
    expect(parsed.meta.fields).toEqual([...IMPORT_COLUMNS]);
    expect(parsed.data).toHaveLength(1);
    const preview = await upload(boss, "/api/visit-imports/preview", res.text).expect(200);
    expect(preview.body.rows[0]).toMatchObject({ ok: true, errors: {}, customerAction: "create", visitAction: "create" });
  });
});

describe("preview", () => {
  it("reports each row: what it would create, and what is wrong by column", async () => {
    const before = await counts();
    const res = await upload(boss, "/api/visit-imports/preview", dayFileWithPia()).expect(200);
    expect(res.body).toMatchObject({ total: 10, valid: 5, invalid: 5 });
    expect(res.body.batchId).toEqual(expect.any(Number));
    const rows = byRow(res.body.rows);
    expect(rows[2]).toMatchObject({ ok: true, customerAction: "create", visitAction: "create", errors: {} });
    expect(rows[2]!.visitKey).toMatch(/^csv:[0-9a-f]{64}$/);
    expect(rows[3]).toMatchObject({ ok: true, customerAction: "match", visitAction: "create" }); // Una again, created by row 2
    expect(rows[4]).toMatchObject({ ok: true, visitAction: "duplicate_in_file", duplicateOfRow: 2 });
    expect(Object.keys(rows[5]!.errors)).toEqual(expect.arrayContaining(["email", "visit_date", "services", "seed_percent"]));
    expect(rows[5]!.errors.services).toMatch(/moonwalking/);
    expect(Object.keys(rows[6]!.errors)).toEqual(expect.arrayContaining(["first_name", "street", "area_ft2"]));
    expect(rows[6]!.errors.area_ft2).toMatch(/not a number/);
    expect(rows[7]!.errors).toEqual({ technician_email: expect.stringMatching(/No active technician/) });
    // A frost before the visit is accepted (the plan's season check calls the work late); the height is not.
    expect(rows[8]!.errors).toEqual({ mowing_height_in: expect.any(String) });
    expect(rows[9]).toMatchObject({ ok: true, customerAction: "create" });
    expect(rows[10]).toMatchObject({ ok: true, customerAction: "match", errors: {} }); // Pia, by e-mail; her lawn's stored facts fill the blanks
    expect(rows[11]!.errors).toEqual({ email: "Already belongs to another account" });
    expect(await counts()).toEqual(before); // a preview writes nothing
  });

  it("refuses a file with an unknown column, no file, or too big a file", async () => {
    const misspelt = upload(boss, "/api/visit-imports/preview", "customer_ref,street,visit_date,services,area_ft2,seed_rate\nR-1,1 A St,2026-09-01,overseeding,100,5\n");
    expect((await misspelt.expect(400)).body.error).toMatchObject({ code: "invalid_file", message: expect.stringMatching(/seed_rate/) });
    const missing = await upload(boss, "/api/visit-imports/preview", "customer_ref,street\nR-1,1 A St\n").expect(400);
    expect(missing.body.error.message).toMatch(/visit_date/);
    await boss.post("/api/visit-imports/preview").send({}).expect(400);
    const big = `${IMPORT_COLUMNS.join(",")}\n${`${"x,".repeat(IMPORT_COLUMNS.length - 1)}x\n`.repeat(40_000)}`;
    expect((await upload(boss, "/api/visit-imports/preview", big).expect(413)).body.error.code).toBe("file_too_large");
  });
});

describe("import", () => {
  let batchId: number;

  it("creates customers, lawns, visits and plans row by row, and reports every row", async () => {
    const before = await counts();
    const res = await upload(boss, "/api/visit-imports", dayFileWithPia()).expect(200);
    batchId = res.body.batchId;
    expect(res.body).toMatchObject({ total: 10, created: 4, alreadyImported: 0, duplicates: 1, failed: 5 });
    const rows = Object.fromEntries(res.body.rows.map((r: { row: number }) => [r.row, r]));
    expect(rows[2]).toMatchObject({ outcome: "created", visitId: expect.any(Number), planId: expect.any(Number) });
    expect(rows[4]).toMatchObject({ outcome: "duplicate_in_file", duplicateOfRow: 2 });
    expect(rows[5]).toMatchObject({ outcome: "failed", errors: expect.objectContaining({ visit_date: expect.any(String) }) });
    expect(rows[10]).toMatchObject({ outcome: "created", customerId: preExisting.customerId });

    // Una (2 visits on one lawn), Seb (new), Pia (matched): 2 new customers, 2 new lawns, 4 visits, 4 plans.
    expect(await counts()).toEqual({ customers: before.customers + 2, properties: before.properties + 2, visits: before.visits + 4, plans: before.plans + 4 });
    const una = await ctx.db("customers").join("users", "users.id", "customers.user_id").where({ "customers.company_id": companyId, external_ref: "R-1" }).first("users.role", "users.email", "customers.first_name");
    expect(una).toMatchObject({ role: "customer", email: `una.${tag}@mail.example`, first_name: "Una" });
    const seb = await ctx.db("customers").join("users", "users.id", "customers.user_id").where({ "customers.company_id": companyId, external_ref: "R-6" }).first("users.phone");
    expect(seb.phone).toBe("+13305550177");
    const pia = await ctx.db("customers").where({ id: preExisting.customerId }).first("external_ref");
    expect(pia.external_ref).toBe("R-7");
    const visit = await ctx.db("service_visits").where({ id: rows[2].visitId }).first();
    expect(visit).toMatchObject({ visit_date: "2026-09-08", services: ["aeration", "overseeding"], import_key: expect.stringMatching(/^csv:/) });
    expect(visit.technician_id).toBe((await ctx.db("users").where({ email: `tech.${tag}@import.example` }).first("id")).id);
    // An imported visit's plan starts on the day of the import: no step is born missed.
    const lawnZone = (await ctx.db("properties").where({ id: visit.property_id }).first("time_zone")).time_zone as string;
    const stepDates = (await ctx.db("plan_steps").where({ plan_id: rows[2].planId }).pluck("date")) as string[];
    expect(stepDates.filter((d) => d < localDateAt(lawnZone))).toEqual([]);
    const plan = await ctx.db("care_plans").where({ id: rows[2].planId }).first("figures");
    expect(plan.figures.meta.visitDate).toBe("2026-09-08");
  });

  it("shows the batch's progress", async () => {
    const res = await boss.get(`/api/visit-imports/${batchId}`).expect(200);
    expect(res.body).toMatchObject({ batchId, status: "done", total: 10, processed: 10, created: 4, finishedAt: expect.any(String) });
    await boss.get("/api/visit-imports/2000000000").expect(404);
  });

  it("creates nothing twice when the same file is imported again", async () => {
    const before = await counts();
    const res = await upload(boss, "/api/visit-imports", dayFileWithPia()).expect(200);
    expect(res.body).toMatchObject({ batchId, total: 10, created: 0, alreadyImported: 4, duplicates: 1, failed: 5 });
    expect(await counts()).toEqual(before);
    const preview = await upload(boss, "/api/visit-imports/preview", dayFileWithPia()).expect(200);
    expect(byRow(preview.body.rows)[2]).toMatchObject({ ok: true, visitAction: "already_imported", customerAction: "match" });
    const status = await boss.get(`/api/visit-imports/${batchId}`).expect(200);
    expect(status.body.created).toBe(4); // over both runs
  });

  it("imports the fixed rows of a corrected file, and only those", async () => {
    const before = await counts();
    const fixed = toCsv([
      good(), // already imported: the same key whatever the file
      good({ customer_ref: "R-4", email: `r4.${tag}@mail.example`, street: "7 GHOST  Lane", technician_email: "" }),
    ]);
    const res = await upload(boss, "/api/visit-imports", fixed, "fixed.csv").expect(200);
    expect(res.body).toMatchObject({ created: 1, alreadyImported: 1, failed: 0 });
    expect(await counts()).toEqual({ customers: before.customers + 1, properties: before.properties + 1, visits: before.visits + 1, plans: before.plans + 1 });
  });

  it("reads a file as US spreadsheets save it: month-first dates, mixed line endings, a byte-order mark", async () => {
    const before = await counts();
    const lines = toCsv([
      good({ customer_ref: "US-1", email: `us1.${tag}@mail.example`, street: "1 Month First Way", visit_date: "09/08/2026", expected_first_frost: "10/24/2026", irrigation: "hose_end", sprinkler_type: "Oscillating", precipitation_rate_in_per_h: "" }),
      good({ customer_ref: "US-2", email: `us2.${tag}@mail.example`, street: "2 Month First Way", visit_date: "9/9/2026", sprinkler_type: "rotor", precipitation_rate_in_per_h: "" }),
      good({ customer_ref: "US-3", email: `us3.${tag}@mail.example`, street: "3 Month First Way", visit_date: "2026-09-10" }),
    ]).split("\r\n");
    // Excel's byte-order mark, then CRLF, LF and a lone CR between the lines.
    const file = `\uFEFF${lines[0]}\r\n${lines[1]}\n${lines[2]}\r${lines[3]}\r\n`;
    const res = await upload(boss, "/api/visit-imports", file, "us.csv").expect(200);
    expect(res.body).toMatchObject({ total: 3, created: 3, failed: 0 });
    expect(res.body.rows.map((r: { row: number }) => r.row)).toEqual([2, 3, 4]);
    const [hoseEnd, rotor] = res.body.rows as { visitId: number; planId: number }[];
    const visit = await ctx.db("service_visits").where({ id: hoseEnd!.visitId }).first("visit_date", "property_id");
    expect(visit.visit_date).toBe("2026-09-08");
    const lawn = (await ctx.db("properties").where({ id: visit.property_id }).first("lawn")).lawn;
    expect(lawn).toMatchObject({ expectedFirstFrost: "2026-10-24", irrigation: { kind: "hose_end", sprinklerType: "oscillating" } });
    expect(lawn.irrigation.precipitationRateInPerHour).toBeUndefined();
    // The sprinkler type reaches the plan: its unmeasured rate comes from the type's range (shared/engine/tables/sprinklers.ts).
    const summaryOf = async (planId: number) => (await ctx.db("care_plans").where({ id: planId }).first("figures")).figures.summary;
    expect((await summaryOf(hoseEnd!.planId)).precipitationRateDefault).toMatchObject({ basis: "sprinkler_type", minInPerHour: 0.1, maxInPerHour: 0.5 });
    expect((await summaryOf(rotor!.planId)).precipitationRateDefault).toMatchObject({ basis: "sprinkler_type", minInPerHour: 0.4, maxInPerHour: 0.8 });
    expect(await counts()).toEqual({ customers: before.customers + 3, properties: before.properties + 3, visits: before.visits + 3, plans: before.plans + 3 });
  });

  it("names the row and the column of every wrong date and sprinkler cell", async () => {
    const file = toCsv([
      good({ customer_ref: "BAD-1", email: `bad1.${tag}@mail.example`, street: "1 Wrong Way", visit_date: "25/09/2026" }),
      good({ customer_ref: "BAD-2", email: `bad2.${tag}@mail.example`, street: "2 Wrong Way", visit_date: "9/8/26", expected_first_frost: "0000-10-24" }),
      good({ customer_ref: "BAD-3", email: `bad3.${tag}@mail.example`, street: "3 Wrong Way", sprinkler_type: "sprayer" }),
      good({ customer_ref: "BAD-4", email: `bad4.${tag}@mail.example`, street: "4 Wrong Way", irrigation: "none", sprinkler_type: "rotor", precipitation_rate_in_per_h: "" }),
      good({ customer_ref: "BAD-5", email: `bad5.${tag}@mail.example`, street: "5 Wrong Way", irrigation: "", sprinkler_type: "rotor", precipitation_rate_in_per_h: "" }),
    ]);
    const nul = toCsv([good({ customer_ref: "BAD\u00007", email: `bad7.${tag}@mail.example`, street: "7 Wrong\u0000 Way" })]).split("\r\n")[1];
    const res = await upload(boss, "/api/visit-imports/preview", `${file}\nBAD-6,6 Wrong Way,9/8/2026\n${nul}\n`).expect(200);
    const rows = byRow(res.body.rows);
    expect(rows[2]!.errors).toEqual({ visit_date: expect.stringMatching(/no month 25.*month first/) });
    expect(rows[3]!.errors).toEqual({ visit_date: "Write the year in full: 9/8/2026", expected_first_frost: "Use a date from 1900 to 2199" });
    expect(rows[4]!.errors).toEqual({ sprinkler_type: "Use one of: fixed_spray, rotor, oscillating, impact" });
    expect(rows[5]!.errors).toEqual({ sprinkler_type: expect.stringMatching(/without irrigation has no sprinkler/) });
    expect(rows[6]!.errors).toEqual({ irrigation: "Give the irrigation kind with a sprinkler type" });
    expect(rows[8]!.errors).toEqual({ street: expect.stringMatching(/NUL character/), customer_ref: expect.stringMatching(/NUL character/) });
    expect(rows[7]!.errors.row).toMatch(/^This row has 3 cells where the header has \d+: column D \(email\) and after are missing/);
  });

  it("reads the lawn as found (slope and shade) onto the lawn, and the row's plan is made from it", async () => {
    type Plan = { steps: { key: string; kind: string; title: string }[]; warnings: { code: string; audience: string }[] };
    const planOf = async (planId: number) => (await boss.get(`/api/plans/${planId}`).expect(200)).body.plan as Plan;
    const lawnOfVisit = async (visitId: number) => {
      const { property_id } = await ctx.db("service_visits").where({ id: visitId }).first("property_id");
      return (await ctx.db("properties").where({ id: property_id }).first("lawn")).lawn as Record<string, unknown>;
    };
    // Yesterday's visits with a first frost weeks away (as the visit-form test does), so the plans water whatever month the suite runs in.
    const today = localDateAt("America/New_York");
    const lawnToday = { time_zone: "America/New_York", expected_first_frost: addDays(today, 50), slope: "Steep", shade: "heavy" };
    const noSeed = { seed_species: "", seed_purity_pct: "", seed_germination_pct: "", seed_rate_lb_per_1000: "" };
    const file = toCsv([
      /* 2 */ good({ customer_ref: "SL-1", email: `sl1.${tag}@mail.example`, street: "1 Hillside Bank", visit_date: addDays(today, -1), services: "sod_installation", ...noSeed, ...lawnToday }),
      /* 3 */ good({ customer_ref: "SL-2", email: `sl2.${tag}@mail.example`, street: "2 Hillside Bank", visit_date: addDays(today, -1), ...lawnToday }),
      /* 4 */ good({ customer_ref: "SL-3", email: `sl3.${tag}@mail.example`, street: "3 Hillside Bank", slope: "cliff", shade: "dark" }),
    ]);
    const res = await upload(boss, "/api/visit-imports", file, "slopes.csv").expect(200);
    expect(res.body).toMatchObject({ total: 3, created: 2, failed: 1 });
    const [sod, seeded, wrong] = res.body.rows as { visitId: number; planId: number; errors: Record<string, string> }[];
    expect(wrong!.errors).toEqual({ slope: "Use one of: none, gentle, steep", shade: "Use one of: none, partial, heavy" });

    expect(await lawnOfVisit(sod!.visitId)).toMatchObject({ slope: "steep", shade: "heavy", lawnCondition: "thin" });
    const sodPlan = await planOf(sod!.planId);
    const watering = sodPlan.steps.filter((s) => s.kind === "water");
    expect(watering.length).toBeGreaterThan(0);
    // Steep slope: every watering is split into short runs (cycle-and-soak, shared/engine/rules/slopes.ts).
    expect(watering.every((s) => / runs of \d+ minutes per zone/.test(s.title))).toBe(true);
    expect(sodPlan.warnings).toContainEqual(expect.objectContaining({ code: "slope_sod_pinning", audience: "crew" }));
    expect(sodPlan.steps.some((s) => s.key === "note:shade_care")).toBe(true);

    // Tall fescue alone is not a heavy-shade grass (shared/engine/tables/shade.ts): the crew is warned.
    const seededPlan = await planOf(seeded!.planId);
    expect(seededPlan.warnings).toContainEqual(expect.objectContaining({ code: "shade_mix_low_tolerance", audience: "crew" }));
    expect(seededPlan.warnings).toContainEqual(expect.objectContaining({ code: "slope_erosion_control", audience: "crew" }));

    // The same lawn's next visit, shade cleared (trees came down), slope left blank: only the shade changes.
    const before = await lawnOfVisit(sod!.visitId);
    const next = toCsv([good({ customer_ref: "SL-1", email: `sl1.${tag}@mail.example`, street: "1 Hillside Bank", visit_date: today, services: "fertiliser_only", ...noSeed,
      product_name: "Autumn 24-0-12", product_n: "24", product_p: "0", product_k: "12", product_rate_lb_per_1000: "3",
      grass_species: "", lawn_condition: "", irrigation: "", precipitation_rate_in_per_h: "", mowing_height_in: "", mower_highest_in: "", expected_first_frost: "", slope: "", shade: "none" })]);
    const again = await upload(boss, "/api/visit-imports", next, "next.csv").expect(200);
    expect(again.body).toMatchObject({ created: 1, failed: 0 });
    expect(await lawnOfVisit(again.body.rows[0].visitId)).toEqual({ ...before, shade: "none" });
    expect((await planOf(again.body.rows[0].planId)).steps.some((s) => s.key === "note:shade_care")).toBe(false);
  });

  it("is for managers only", async () => {
    const tech = await signInStaff(ctx, `tech.${tag}@import.example`);
    await upload(tech, "/api/visit-imports", dayFile).expect(403);
    await upload(tech, "/api/visit-imports/preview", dayFile).expect(403);
    await tech.get("/api/visit-imports/template.csv").expect(403);
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await upload(ruth, "/api/visit-imports", dayFile).expect(403);
  });
});
