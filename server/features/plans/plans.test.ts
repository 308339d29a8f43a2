import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { addDays } from "#shared/engine/index";

let ctx: TestContext;
let technician: ReturnType<typeof request.agent>;
let ruthPropertyId: number;

beforeAll(async () => {
  ctx = await createTestContext();
  technician = await signInStaff(ctx, "marco@cobblefield.example");
  const property = await ctx.db("properties")
    .join("customers", "customers.id", "properties.customer_id")
    .where("customers.external_ref", "C-1001")
    .first<{ id: number }>("properties.id");
  ruthPropertyId = property!.id;
});
afterAll(async () => ctx.close());

const today = () => localDateAt("America/New_York");

function visitBody(overrides: Record<string, unknown> = {}) {
  return {
    propertyId: ruthPropertyId,
    visit: {
      date: addDays(today(), -3),
      services: ["aeration", "overseeding"],
      seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }],
      seedRateLbPer1000: 5,
      areaFt2: 6000,
      products: [],
      ...overrides,
    },
  };
}

async function stepRows(planId: number) {
  return ctx.db("plan_steps").where({ plan_id: planId }).orderBy("key").select("key", "date", "title", "state", "content");
}

describe("logging a visit creates its care plan", () => {
  it("stores the visit, the plan and every step together, and the homeowner can read it", async () => {
    await ctx.fakes.clearOutbox();
    const res = await technician.post("/api/visits").send(visitBody()).expect(201);
    const { visitId, planId } = res.body;
    // The new plan queues a welcome (with its one-time link) on the homeowner's channels; notices.test.ts follows it to the outbox.
    expect(res.body.invitationSent).toBe(true);
    const welcomes = await ctx.db("reminders").where({ plan_id: res.body.planId, kind: "welcome" }).pluck("channel");
    expect(welcomes).toEqual(res.body.welcomeChannels);
    expect(welcomes.length).toBeGreaterThan(0);
    expect(visitId).toBeGreaterThan(0);
    const plan = await ctx.db("care_plans").where({ id: planId }).first();
    expect(plan.visit_id).toBe(visitId);
    expect(plan.program_version).toBe(1);
    expect((await stepRows(planId)).length).toBeGreaterThan(10);

    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const stored = await ruth.get(`/api/plans/${planId}`).expect(200);
    expect(stored.body.plan.steps.some((s: { kind: string }) => s.kind === "water")).toBe(true);
    expect(stored.body.plan.holdOffs.map((h: { kind: string }) => h.kind)).toContain("weed_and_feed");
    const mine = await ruth.get("/api/my/plans").expect(200);
    expect(mine.body.plans.map((p: { id: number }) => p.id)).toContain(planId);

    const tomasz = await signInCustomer(ctx, "tomasz.brandt@mail.example");
    await tomasz.get(`/api/plans/${planId}`).expect(404);
    await tomasz.get(`/api/plans/${planId}/today`).expect(404);
  });

  it("saves nothing when the lawn's stored facts can't make a plan", async () => {
    const before = await ctx.db("service_visits").count<{ count: string }[]>("* as count");
    const lawn = (await ctx.db("properties").where({ id: ruthPropertyId }).first()).lawn;
    await ctx.db("properties").where({ id: ruthPropertyId }).update({ lawn: JSON.stringify({ ...lawn, mowerHighestSettingIn: -1 }) });
    try {
      const res = await technician.post("/api/visits").send(visitBody());
      expect(res.status).toBe(422);
      expect(res.body.error.fields["property.mowerHighestSettingIn"]).toBeDefined();
      const after = await ctx.db("service_visits").count<{ count: string }[]>("* as count");
      expect(after[0]!.count).toBe(before[0]!.count);
    } finally {
      await ctx.db("properties").where({ id: ruthPropertyId }).update({ lawn: JSON.stringify(lawn) });
    }
  });

  it("refuses a bad visit with field errors", async () => {
    const res = await technician.post("/api/visits").send(visitBody({ areaFt2: -5, seedMix: [{ species: "tall_fescue", percent: 90, purityPct: 98, germinationPct: 90 }] }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields["visit.areaFt2"]).toBeDefined();
    expect(res.body.error.fields["visit.seedMix"]).toMatch(/100/);
  });

  it("keeps customers out of visit logging", async () => {
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await ruth.post("/api/visits").send(visitBody()).expect(403);
  });
});

describe("plan preview", () => {
  it("returns a plan without saving anything", async () => {
    const before = await ctx.db("care_plans").count<{ count: string }[]>("* as count");
    const lawn = (await ctx.db("properties").where({ id: ruthPropertyId }).first()).lawn;
    const body = { visit: visitBody().visit, property: { ...lawn, timeZone: "America/Chicago", expectedFirstFrost: addDays(today(), 20) } };
    const res = await technician.post("/api/plans/preview").send(body).expect(200);
    expect(res.body.plan.meta.programVersion).toBe(1);
    expect(res.body.plan.warnings.map((w: { code: string; severity: string }) => w.severity)).toContain("risk");
    const after = await ctx.db("care_plans").count<{ count: string }[]>("* as count");
    expect(after[0]!.count).toBe(before[0]!.count);
  });

  it("names the fields that are wrong", async () => {
    const lawn = (await ctx.db("properties").where({ id: ruthPropertyId }).first()).lawn;
    const res = await technician.post("/api/plans/preview").send({
      visit: { ...visitBody().visit, products: [{ name: "Too strong", analysis: { n: 80, p: 30, k: 0 }, rateLbPer1000: 3 }] },
      property: { ...lawn, timeZone: "Mars/Olympus_Mons" },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(["visit.products.0.analysis", "property.timeZone"]));
  });
});

describe("changing and recomputing a plan", () => {
  it("ticks a step off and undoes it", async () => {
    const { planId } = (await technician.post("/api/visits").send(visitBody({ date: today() })).expect(201)).body;
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const todayView = await ruth.get(`/api/plans/${planId}/today`).expect(200);
    expect(todayView.body.today).toBe(today());
    const step = todayView.body.steps[0];
    expect(step).toBeDefined();
    const done = await ruth.put(`/api/plans/${planId}/steps/${step.id}/state`).send({ state: "done" }).expect(200);
    expect(done.body.step.state).toBe("done");
    const skipped = await ruth.put(`/api/plans/${planId}/steps/${step.id}/state`).send({ state: "skipped", reason: "It rained" }).expect(200);
    expect(skipped.body.step).toMatchObject({ state: "skipped", skipReason: "It rained" });
    const undone = await ruth.put(`/api/plans/${planId}/steps/${step.id}/state`).send({ state: "pending" }).expect(200);
    expect(undone.body.step).toMatchObject({ state: "pending", skipReason: null, stateChangedAt: null });
    const bad = await ruth.put(`/api/plans/${planId}/steps/${step.id}/state`).send({ state: "maybe" });
    expect(bad.status).toBe(400);
  });

  it("Today's one-query answer agrees with the whole plan: today's steps with their state, the next milestone, active hold-offs", async () => {
    const { planId } = (await technician.post("/api/visits").send(visitBody({ date: addDays(today(), -1) })).expect(201)).body;
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const first = (await ruth.get(`/api/plans/${planId}/today`).expect(200)).body;
    await ruth.put(`/api/plans/${planId}/steps/${first.steps[0].id}/state`).send({ state: "skipped", reason: "Rain" }).expect(200);

    const view = (await ruth.get(`/api/plans/${planId}/today`).expect(200)).body;
    const whole = (await ruth.get(`/api/plans/${planId}`).expect(200)).body.plan;
    type Step = { id: number; date: string; kind: string; title: string };
    const day = view.today as string;
    expect(view.steps).toEqual(whole.steps.filter((s: Step) => s.date === day));
    expect(view.steps[0]).toMatchObject({ state: "skipped", skipReason: "Rain", stateChangedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/) });
    const next = whole.steps.find((s: Step) => s.date > day && ["mow", "check_in_photo", "feed"].includes(s.kind));
    expect(next).toBeDefined();
    expect(view.nextMilestone).toEqual({ kind: next.kind, date: next.date, title: next.title });
    const active = whole.holdOffs.filter((h: { start: string; end: string }) => h.start <= day && day <= h.end);
    expect(active.length).toBeGreaterThan(0);
    expect(view.activeHoldOffs).toEqual(active);
    expect(view.plan).toEqual(expect.objectContaining({ id: planId, progress: expect.objectContaining({ skipped: 1 }) }));
  });

  it("answers many Today requests at once, each with its own plan, and refuses a plan that is someone else's", async () => {
    const ruthPlan = (await technician.post("/api/visits").send(visitBody()).expect(201)).body.planId as number;
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const tomasz = await signInCustomer(ctx, "tomasz.brandt@mail.example");
    const tomaszPlan = (await tomasz.get("/api/my/plans").expect(200)).body.plans[0].id as number;
    const asked = Array.from({ length: 24 }, (_, i) =>
      [
        { agent: ruth, planId: ruthPlan, status: 200 },
        { agent: tomasz, planId: tomaszPlan, status: 200 },
        { agent: tomasz, planId: ruthPlan, status: 404 },
      ][i % 3]!,
    );
    const answers = await Promise.all(asked.map(({ agent, planId }) => agent.get(`/api/plans/${planId}/today`)));
    expect(answers.map((a) => a.status)).toEqual(asked.map((a) => a.status));
    const answered = answers.flatMap((a, i) => (a.status === 200 ? [{ asked: asked[i]!.planId, got: a.body.plan.id }] : []));
    expect(answered.map((a) => a.got)).toEqual(answered.map((a) => a.asked));
  });

  it("regenerates idempotently and keeps what the homeowner did", async () => {
    const { planId } = (await technician.post("/api/visits").send(visitBody()).expect(201)).body;
    const first = (await stepRows(planId)).find((s) => s.date <= today())!;
    await ctx.db("plan_steps").where({ plan_id: planId, key: first.key }).update({ state: "done" });

    await technician.post(`/api/plans/${planId}/regenerate`).expect(200);
    const once = await stepRows(planId);
    await technician.post(`/api/plans/${planId}/regenerate`).expect(200);
    const twice = await stepRows(planId);
    expect(twice).toEqual(once);
    expect(twice.find((s) => s.key === first.key)).toMatchObject({ state: "done", date: first.date });
  });

  it("moves future steps when the visit date moves, keeping completed ones", async () => {
    const { visitId, planId } = (await technician.post("/api/visits").send(visitBody({ date: addDays(today(), 2) })).expect(201)).body;
    const before = await stepRows(planId);
    const lastBefore = before.map((s) => s.date).sort().at(-1);
    await technician.patch(`/api/visits/${visitId}`).send({ date: addDays(today(), 9) }).expect(200);
    const after = await stepRows(planId);
    const lastAfter = after.map((s) => s.date).sort().at(-1);
    expect(lastAfter! > lastBefore!).toBe(true);
  });

  it("recomputes when the homeowner reports sprouts early", async () => {
    const { planId } = (await technician.post("/api/visits").send(visitBody({ date: addDays(today(), -5) })).expect(201)).body;
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const res = await ruth.post(`/api/plans/${planId}/observations`).send({ kind: "sprouts_seen", onDay: 5 }).expect(200);
    expect(res.body.plan.steps.length).toBeGreaterThan(0);
    const stored = await ctx.db("care_plans").where({ id: planId }).first();
    expect(stored.observations).toEqual([{ kind: "sprouts_seen", onDay: 5 }]);
  });
});

describe("demo seeds", () => {
  it("can run twice without duplicating anything", async () => {
    const count = async () => {
      const tables = ["companies", "users", "customers", "properties", "service_visits", "care_plans", "plan_steps", "program_settings"];
      return Object.fromEntries(await Promise.all(tables.map(async (t) => [t, (await ctx.db(t).count<{ count: string }[]>("* as count"))[0]!.count])));
    };
    const before = await count();
    await ctx.db.seed.run();
    expect(await count()).toEqual(before);
  });
});
