import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { createCustomer, createIsolatedCompany } from "../follow-ups/testing/isolated-company.ts";
import { likeLiteral } from "./repo.ts";

type Agent = ReturnType<typeof request.agent>;
let ctx: TestContext;
let marco: Agent;
let ruthId: number;

beforeAll(async () => {
  ctx = await createTestContext();
  marco = await signInStaff(ctx, "marco@cobblefield.example");
  ruthId = (await ctx.db("customers").where({ external_ref: "C-1001" }).first<{ id: number }>("id"))!.id;
});
afterAll(async () => ctx.close());

const search = async (q: string) => (await marco.get("/api/customers").query({ q }).expect(200)).body.customers as { id: number; firstName: string; lastName: string }[];

describe("customer search", () => {
  it("finds a customer by name, street, e-mail or phone digits in any format", async () => {
    for (const q of ["Okonkwo", "ruth oko", "Larkspur", "RUTH.OKONKWO@mail", "(330) 555-0111", "555 0111"]) {
      expect((await search(q)).map((c) => c.id), q).toContain(ruthId);
    }
    const [first] = await search("Okonkwo");
    expect(first).toMatchObject({ firstName: "Ruth", lastName: "Okonkwo", email: "ruth.okonkwo@mail.example", phone: "+13305550111", externalRef: "C-1001" });
    expect((first as unknown as { properties: { street: string }[] }).properties[0]!.street).toBe("14 Larkspur Lane");
    expect((await search("Zebediah Nobody")).length).toBe(0);
  });

  it("treats % and _ as plain characters and stays within the company", async () => {
    expect(likeLiteral("50%_off\\")).toBe("50\\%\\_off\\\\");
    expect(await search("%")).toEqual([]);
    const other = await createIsolatedCompany(ctx.db, `customers-${Date.now()}`, []);
    await createCustomer(ctx.db, other.companyId, { first: "Ruth", last: "Okonkwo-Elsewhere" });
    expect((await search("Okonkwo")).map((c) => c.lastName)).not.toContain("Okonkwo-Elsewhere");
  });
});

describe("customer page", () => {
  it("shows properties, plans with progress, visits and follow-ups, and is written to the audit log", async () => {
    const property = await ctx.db("properties").where({ customer_id: ruthId }).first<{ id: number }>("id");
    const plan = await ctx.db("care_plans").where({ property_id: property!.id }).first<{ id: number }>("id");
    await marco.post("/api/follow-ups").send({ propertyId: property!.id, planId: plan!.id, reason: "under_watering", isCallback: true }).expect(201);
    // A question on the plan's thread and a reminder that could not be delivered.
    await ctx.db("conversations").insert({ plan_id: plan!.id }).onConflict("plan_id").ignore();
    const conversation = await ctx.db("conversations").where({ plan_id: plan!.id }).first<{ id: number }>("id");
    const asked = new Date(Date.now() + 60_000);
    await ctx.db("messages").insert({ conversation_id: conversation!.id, kind: "question", text: "Is the yellow normal? (customers test)", created_at: asked });
    const dueAt = new Date("2099-06-01T12:00:00Z");
    const [reminder] = await ctx.db("reminders")
      .insert({
        customer_id: ruthId, plan_id: plan!.id, kind: "daily_summary", local_date: "2099-06-01", local_time: "08:00", time_zone: "America/New_York",
        channel: "sms", due_at: dueAt, next_attempt_at: dueAt, state: "failed", attempts: 3, last_error: "Unreachable handset (test)",
      })
      .returning<{ id: string }[]>("id");

    const res = await marco.get(`/api/customers/${ruthId}`).expect(200);
    expect(res.body.customer).toMatchObject({ id: ruthId, firstName: "Ruth", externalRef: "C-1001" });
    expect(res.body.properties.map((p: { street: string }) => p.street)).toContain("14 Larkspur Lane");
    expect(res.body.plans.length).toBeGreaterThan(0);
    const progress = res.body.plans[0].progress;
    expect(progress.total).toBeGreaterThan(0);
    expect(progress.done).toBeLessThanOrEqual(progress.total);
    expect(res.body.visits[0]).toMatchObject({ services: expect.any(Array), planId: expect.any(Number) });
    expect(res.body.followUps.some((f: { reason: string; isCallback: boolean }) => f.reason === "under_watering" && f.isCallback)).toBe(true);
    const thread = res.body.conversations.find((c: { planId: number }) => c.planId === plan!.id);
    expect(thread).toMatchObject({ planId: plan!.id, messageCount: expect.any(Number), lastMessageAt: asked.toISOString() });
    expect(thread.openQuestions).toBeGreaterThanOrEqual(1);
    expect(thread.messageCount).toBeGreaterThanOrEqual(thread.openQuestions);
    expect(res.body.reminders.length).toBeLessThanOrEqual(50);
    expect(res.body.reminders[0]).toEqual({
      id: Number(reminder!.id), planId: plan!.id, kind: "daily_summary", channel: "sms", localDate: "2099-06-01", localTime: "08:00",
      dueAt: dueAt.toISOString(), sendDate: "2099-06-01", sendTime: "08:00", timeZone: "America/New_York", heldForQuietHours: false, state: "failed", attempts: 3, lastError: "Unreachable handset (test)", sentAt: null,
    });

    // Audit entries are written after the response; give it a moment.
    await new Promise((r) => setTimeout(r, 100));
    const audit = await ctx.db("audit_log").where({ action: "customer.read", subject_id: String(ruthId) }).first();
    expect(audit).toBeDefined();
  });

  it("answers 404 for another company's customer and 403 to customers", async () => {
    const other = await createIsolatedCompany(ctx.db, `customers-b-${Date.now()}`, []);
    const stranger = await createCustomer(ctx.db, other.companyId, { first: "Sven", last: "Stranger" });
    await marco.get(`/api/customers/${stranger.customerId}`).expect(404);
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await ruth.get(`/api/customers/${ruthId}`).expect(403);
    await ruth.get("/api/customers").query({ q: "a" }).expect(403);
  });
});
