import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { unreadResponseSchema } from "#shared/schemas/unread";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { createPlanFixture } from "../questions/testing/plan-fixture.ts";

type Agent = ReturnType<typeof request.agent>;

let ctx: TestContext;
let ruth: Agent;
let tomasz: Agent;
let marco: Agent;
let ruthPlan: number;
let ruthOtherPlan: number;
let tomaszPlan: number;

async function unread(agent: Agent) {
  const res = await agent.get("/api/my/unread").expect(200);
  return unreadResponseSchema.parse(res.body);
}

const countFor = (body: { plans: { planId: number; unread: number }[] }, planId: number) => body.plans.find((p) => p.planId === planId)?.unread ?? 0;

async function answer(planId: number, text: string) {
  await marco.post(`/api/plans/${planId}/answers`).field("text", text).expect(201);
}

/** A staff-only note, written as the staff app does not expose one to customers. */
async function staffNote(planId: number) {
  const conversation = await ctx.db("conversations").where({ plan_id: planId }).first<{ id: number }>("id");
  const marcoUser = await ctx.db("users").where({ email: "marco@cobblefield.example" }).first<{ id: number }>("id");
  await ctx.db("messages").insert({ conversation_id: conversation!.id, kind: "note", author_user_id: marcoUser!.id, text: "Customer sounds worried; call if no reply." });
}

beforeAll(async () => {
  ctx = await createTestContext();
  ({ planId: ruthPlan } = await createPlanFixture(ctx.db, { customerRef: "C-1001" }));
  ({ planId: ruthOtherPlan } = await createPlanFixture(ctx.db, { customerRef: "C-1001", visitDate: "2026-09-20" }));
  ({ planId: tomaszPlan } = await createPlanFixture(ctx.db, { customerRef: "C-1002" }));
  ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
  tomasz = await signInCustomer(ctx, "tomasz.brandt@mail.example");
  marco = await signInStaff(ctx, "marco@cobblefield.example");
  // Start every fixture plan from "all read", whatever earlier test files left in the shared database.
  for (const [agent, planId] of [[ruth, ruthPlan], [ruth, ruthOtherPlan], [tomasz, tomaszPlan]] as const) {
    await agent.get(`/api/plans/${planId}/thread`).expect(200);
  }
});

afterAll(async () => {
  await ctx.close();
});

describe("GET /api/my/unread", () => {
  it("counts staff answers per plan, only on the customer's own plans", async () => {
    const before = await unread(ruth);
    const tomaszBefore = await unread(tomasz);

    await answer(ruthPlan, "Those thin spots should fill in within two weeks.");
    await answer(ruthPlan, "Keep the top half-inch damp until then.");
    await answer(ruthOtherPlan, "Yes, you can mow the front once it reaches 4 inches.");
    await answer(tomaszPlan, "That is crabgrass, not new seed.");

    const after = await unread(ruth);
    expect(countFor(after, ruthPlan)).toBe(countFor(before, ruthPlan) + 2);
    expect(countFor(after, ruthOtherPlan)).toBe(countFor(before, ruthOtherPlan) + 1);
    expect(after.plans.map((p) => p.planId)).not.toContain(tomaszPlan);
    expect(after.total).toBe(after.plans.reduce((sum, p) => sum + p.unread, 0));

    const tomaszAfter = await unread(tomasz);
    expect(countFor(tomaszAfter, tomaszPlan)).toBe(countFor(tomaszBefore, tomaszPlan) + 1);
    expect(tomaszAfter.plans.map((p) => p.planId)).not.toContain(ruthPlan);
  });

  it("does not count staff-only notes or the customer's own questions", async () => {
    await ruth.get(`/api/plans/${ruthPlan}/thread`).expect(200);
    expect(countFor(await unread(ruth), ruthPlan)).toBe(0);

    await staffNote(ruthPlan);
    await ruth.post(`/api/plans/${ruthPlan}/questions`).field("text", "Should I water tonight as well?").expect(201);
    expect(countFor(await unread(ruth), ruthPlan)).toBe(0);

    await answer(ruthPlan, "Not tonight: the forecast has rain.");
    expect(countFor(await unread(ruth), ruthPlan)).toBe(1);
  });

  it("drops to 0 for a plan once its thread is read, leaving other plans as they were", async () => {
    await answer(ruthOtherPlan, "The bare patch by the driveway needs a second seeding.");
    const before = await unread(ruth);
    expect(countFor(before, ruthOtherPlan)).toBeGreaterThan(0);

    await ruth.get(`/api/plans/${ruthOtherPlan}/thread`).expect(200);
    const after = await unread(ruth);
    expect(countFor(after, ruthOtherPlan)).toBe(0);
    expect(after.plans.map((p) => p.planId)).not.toContain(ruthOtherPlan);
    expect(countFor(after, ruthPlan)).toBe(countFor(before, ruthPlan));
  });

  it("does not move when staff read the thread", async () => {
    await answer(ruthPlan, "One more thing: skip the fertilizer this week.");
    const before = countFor(await unread(ruth), ruthPlan);
    await marco.get(`/api/plans/${ruthPlan}/thread`).expect(200);
    expect(countFor(await unread(ruth), ruthPlan)).toBe(before);
  });

  it("is for homeowners only", async () => {
    await marco.get("/api/my/unread").expect(403);
    await request(ctx.app).get("/api/my/unread").expect(401);
  });
});
