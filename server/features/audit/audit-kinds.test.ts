import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { auditSubjectTypes } from "#shared/schemas/audit";
import { addDays } from "#shared/engine/index";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { collectRoutes } from "../../routes.ts";
import { createMessenger } from "../../messaging/create-messenger.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { createCustomer, createIsolatedCompany } from "../follow-ups/testing/isolated-company.ts";

type Entry = { id: number; action: string; sentence: string; subjectType: string | null; subjectId: string | null; customerName: string | null; street: string | null };

let ctx: TestContext;
const tag = Date.now();
const email = (name: string) => `${name}.${tag}@audit.example`;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

describe("kinds of audit entries", () => {
  it("every audited route's kind is one the filter offers", () => {
    const routes = collectRoutes({ config: ctx.config, db: ctx.db, messenger: createMessenger(ctx.config), log: () => {} });
    const kinds = routes.filter((r) => r.audit).map((r) => r.audit!.split(".")[0]);
    expect(kinds.filter((k) => !(auditSubjectTypes as readonly string[]).includes(k!))).toEqual([]);
  });
});

describe("the audit log records staff changes as sentences, filterable by kind", () => {
  it("records visits, follow-ups, team changes, places and sign-outs with who, what and for whom", async () => {
    // A company of its own, so its log holds exactly what this test does.
    const company = await createIsolatedCompany(ctx.db, `audit-${tag}`, [
      { email: email("ada"), role: "manager", name: "Ada Meyer" },
      { email: email("tom"), role: "technician", name: "Tom Reyes" },
    ]);
    const hana = await createCustomer(ctx.db, company.companyId, { first: "Hana", last: "Sørbye", street: "19 Cobble Row" });
    const manager = await signInStaff(ctx, email("ada"));
    const technician = await signInStaff(ctx, email("tom"));

    const visit = await technician
      .post("/api/visits")
      .send({
        propertyId: hana.propertyId,
        visit: {
          date: addDays(localDateAt("America/New_York"), -3),
          services: ["aeration", "overseeding"],
          seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }],
          seedRateLbPer1000: 5,
          areaFt2: 5000,
          products: [],
        },
      })
      .expect(201);
    await technician.get(`/api/plans/${visit.body.planId}`).expect(200);
    const followUp = await manager.post("/api/follow-ups").send({ propertyId: hana.propertyId, reason: "other" }).expect(201);
    await manager.get(`/api/customers/${hana.customerId}`).expect(200);
    const invited = await manager.post("/api/team/invitations").send({ email: email("nell"), role: "technician", name: "Nell Nguyen" }).expect(201);
    const nellId = String(invited.body.member.id);
    await manager.patch(`/api/team/${nellId}`).send({ role: "manager" }).expect(200);
    await manager.post(`/api/team/${nellId}/deactivate`).expect(200);
    const place = await manager
      .post("/api/place-rules")
      .send({ name: "Audit test place", region: "oh", zipPrefixes: [], fertilizerBlackouts: [], phosphorus: "allowed", watering: { allowedWeekdays: [1, 3, 6], newLawnExemptDays: 0 } })
      .expect(201);
    await manager.delete(`/api/place-rules/${place.body.place.id}`).expect(204);
    await technician.post("/api/auth/sign-out-everywhere").expect(204);

    const expected: { kind: string; action: string; subjectId: string; sentence: string }[] = [
      { kind: "visit", action: "visit.logged", subjectId: String(visit.body.visitId), sentence: "Tom Reyes logged a visit for Hana Sørbye, 19 Cobble Row" },
      { kind: "plan", action: "plan.read", subjectId: String(visit.body.planId), sentence: "Tom Reyes opened the care plan for Hana Sørbye, 19 Cobble Row" },
      { kind: "follow_up", action: "follow_up.created", subjectId: String(followUp.body.followUp.id), sentence: "Ada Meyer booked a follow-up visit for Hana Sørbye, 19 Cobble Row" },
      { kind: "customer", action: "customer.read", subjectId: String(hana.customerId), sentence: "Ada Meyer opened the customer record for Hana Sørbye" },
      { kind: "team", action: "team.invited", subjectId: nellId, sentence: "Ada Meyer invited Nell Nguyen to the team as a technician" },
      { kind: "team", action: "team.role_changed", subjectId: nellId, sentence: "Ada Meyer made Nell Nguyen a manager" },
      { kind: "team", action: "team.deactivated", subjectId: nellId, sentence: "Ada Meyer deactivated Nell Nguyen's account" },
      { kind: "place", action: "place.created", subjectId: String(place.body.place.id), sentence: "Ada Meyer added the place Audit test place" },
      { kind: "place", action: "place.deleted", subjectId: String(place.body.place.id), sentence: "Ada Meyer deleted the place Audit test place" },
      { kind: "account", action: "account.signed_out_everywhere", subjectId: "", sentence: "Tom Reyes signed out on every device" },
    ];

    // Entries are written once each answer has gone out: wait until all are there.
    let all: Entry[] = [];
    for (let i = 0; i < 60 && all.length < expected.length; i++) {
      all = (await manager.get("/api/audit").expect(200)).body.entries;
      if (all.length < expected.length) await new Promise((r) => setTimeout(r, 50));
    }
    expect(all.map((e) => e.sentence).sort()).toEqual(expected.map((e) => e.sentence).sort());

    for (const kind of new Set(expected.map((e) => e.kind))) {
      const filtered: Entry[] = (await manager.get(`/api/audit?subjectType=${kind}`).expect(200)).body.entries;
      const want = expected.filter((e) => e.kind === kind);
      expect(filtered.map((e) => [e.action, e.subjectId ?? "", e.sentence]).sort(), kind).toEqual(want.map((e) => [e.action, e.subjectId, e.sentence]).sort());
    }
    // One record by its number.
    const oneVisit: Entry[] = (await manager.get(`/api/audit?subjectType=visit&subjectId=${visit.body.visitId}`).expect(200)).body.entries;
    expect(oneVisit).toHaveLength(1);
    expect(oneVisit[0]).toMatchObject({ customerName: "Hana Sørbye", street: "19 Cobble Row" });

    // A kind the log doesn't have is a field error, not an empty list that looks like "nothing happened".
    const unknown = await manager.get("/api/audit?subjectType=payments");
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields["query.subjectType"]).toBeDefined();
  });
});
