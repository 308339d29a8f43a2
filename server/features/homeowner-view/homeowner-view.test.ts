import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { homeownerViewResponseSchema } from "#shared/schemas/homeowner-view";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { createCustomer, createHandMadePlan, createIsolatedCompany, createVisit } from "../follow-ups/testing/isolated-company.ts";

let ctx: TestContext;
let tech: ReturnType<typeof request.agent>;
let planId: number;
let otherPlanId: number;
const ids: Record<string, number> = {};

beforeAll(async () => {
  ctx = await createTestContext();
  const stamp = Date.now();
  const made = await createIsolatedCompany(ctx.db, `view-${stamp}`, [{ email: `tech-${stamp}@view.example`, role: "technician", name: "Vic Tech" }]);
  const techId = made.staffIds[`tech-${stamp}@view.example`]!;
  const owner = await createCustomer(ctx.db, made.companyId, { first: "Nell", last: "Brook" });
  ids.homeownerUser = owner.userId;
  ids.techId = techId;
  const visit = await createVisit(ctx.db, owner.propertyId, techId, "2026-09-01", ["overseeding"]);
  planId = await createHandMadePlan(ctx.db, owner.propertyId, visit, [
    { date: "2026-09-02", state: "done" },
    { date: "2026-09-03", state: "skipped" },
    { date: "2026-09-04", state: "pending" },
  ]);
  const steps = await ctx.db("plan_steps").where({ plan_id: planId }).orderBy("date").select<{ id: number }[]>("id");
  await ctx.db("plan_steps").where({ id: steps[0]!.id }).update({ state_changed_by: owner.userId, state_changed_at: new Date("2026-09-02T12:00:00Z") });
  await ctx.db("plan_steps").where({ id: steps[1]!.id }).update({ state_changed_by: techId, state_changed_at: new Date("2026-09-03T15:30:00Z") });
  ids.doneStep = Number(steps[0]!.id);
  ids.skippedStep = Number(steps[1]!.id);

  const other = await createIsolatedCompany(ctx.db, `view-other-${stamp}`, []);
  const stranger = await createCustomer(ctx.db, other.companyId, { first: "Sam", last: "Else" });
  const strangerVisit = await createVisit(ctx.db, stranger.propertyId, null, "2026-09-01", ["overseeding"]);
  otherPlanId = await createHandMadePlan(ctx.db, stranger.propertyId, strangerVisit, []);

  tech = await signInStaff(ctx, `tech-${stamp}@view.example`);
});

afterAll(async () => {
  await ctx.close();
});

describe("GET /api/plans/:planId/homeowner-view", () => {
  it("names the homeowner and says who settled each step and when", async () => {
    const res = await tech.get(`/api/plans/${planId}/homeowner-view`).expect(200);
    const body = homeownerViewResponseSchema.parse(res.body);
    expect(body.homeowner).toMatchObject({ name: "Nell Brook", phone: null });
    expect(body.stepChanges).toEqual([
      { stepId: ids.doneStep, state: "done", changedAt: "2026-09-02T12:00:00.000Z", byName: "Nell Brook", byRole: "customer" },
      { stepId: ids.skippedStep, state: "skipped", changedAt: "2026-09-03T15:30:00.000Z", byName: "Vic Tech", byRole: "technician" },
    ]);
  });

  it("does not find another company's plan", async () => {
    await tech.get(`/api/plans/${otherPlanId}/homeowner-view`).expect(404);
  });
});
