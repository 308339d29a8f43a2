import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { addDays } from "#shared/engine/dates";
import { openQuestionsResponseSchema, type OpenQuestion } from "#shared/schemas/question-queue";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { createPlanFixture, customerByRef } from "./testing/plan-fixture.ts";

type Agent = ReturnType<typeof request.agent>;

let ctx: TestContext;
let marco: Agent;
let dana: Agent;
let ruth: Agent;
const staffIds = {} as Record<"marco" | "dana" | "priya" | "inactive" | "ruth", number>;
const HOUR = 3_600_000;

async function queue(agent: Agent): Promise<OpenQuestion[]> {
  const res = await agent.get("/api/questions/open").expect(200);
  return openQuestionsResponseSchema.parse(res.body).questions;
}

/** A fresh plan (so a fresh conversation) for Ruth, with messages at chosen times. */
async function conversationWith(messages: { kind: "question" | "answer"; hoursAgo: number }[], plan?: { visitDate: string }) {
  const { planId } = await createPlanFixture(ctx.db, { customerRef: "C-1001", visitDate: plan?.visitDate });
  const [conversation] = await ctx.db("conversations").insert({ plan_id: planId }).returning<{ id: number }[]>("id");
  const ids: number[] = [];
  const base = Date.now();
  for (const m of messages) {
    const [row] = await ctx.db("messages")
      .insert({
        conversation_id: conversation!.id, kind: m.kind, text: `${m.kind} ${m.hoursAgo} h ago`,
        author_user_id: m.kind === "question" ? staffIds.ruth : staffIds.marco, created_at: new Date(base - m.hoursAgo * HOUR),
      })
      .returning<{ id: string }[]>("id");
    ids.push(Number(row!.id));
  }
  return { planId, ids };
}

/** A question in another company, which Cobblefield's staff must not find. */
async function otherCompanyQuestion(): Promise<number> {
  const stamp = Date.now();
  const [company] = await ctx.db("companies").insert({ slug: `other-${stamp}`, name: "Other Lawns", time_zone: "America/Chicago", sms_sender_name: "Other" }).returning<{ id: number }[]>("id");
  const [user] = await ctx.db("users").insert({ company_id: company!.id, role: "customer", name: "Olga Other", email: `olga-${stamp}@mail.example` }).returning<{ id: number }[]>("id");
  const [customer] = await ctx.db("customers").insert({ company_id: company!.id, user_id: user!.id, first_name: "Olga", last_name: "Other" }).returning<{ id: number }[]>("id");
  const [property] = await ctx.db("properties").insert({ customer_id: customer!.id, street: "1 Elm St", town: "Springfield", region: "IL", postal_code: "62701", time_zone: "America/Chicago" }).returning<{ id: number }[]>("id");
  const [visit] = await ctx.db("service_visits").insert({ property_id: property!.id, visit_date: "2026-09-15", services: ["overseeding"] }).returning<{ id: number }[]>("id");
  const [plan] = await ctx.db("care_plans").insert({ property_id: property!.id, visit_id: visit!.id, program_version: 1, input: {} }).returning<{ id: number }[]>("id");
  const [conversation] = await ctx.db("conversations").insert({ plan_id: plan!.id }).returning<{ id: number }[]>("id");
  const [message] = await ctx.db("messages").insert({ conversation_id: conversation!.id, kind: "question", text: "Mine?", author_user_id: user!.id }).returning<{ id: string }[]>("id");
  return Number(message!.id);
}

const userId = (email: string) => ctx.db("users").where({ email }).first<{ id: number }>("id").then((u) => u!.id);

beforeAll(async () => {
  ctx = await createTestContext();
  staffIds.marco = await userId("marco@cobblefield.example");
  staffIds.dana = await userId("dana@cobblefield.example");
  staffIds.priya = await userId("priya@cobblefield.example");
  staffIds.ruth = await userId("ruth.okonkwo@mail.example");
  const company = await ctx.db("users").where({ id: staffIds.marco }).first<{ company_id: number }>("company_id");
  const [inactive] = await ctx.db("users")
    .insert({ company_id: company!.company_id, role: "technician", name: "Gone Gary", email: `gary-${Date.now()}@cobblefield.example`, active: false })
    .returning<{ id: number }[]>("id");
  staffIds.inactive = inactive!.id;
  marco = await signInStaff(ctx, "marco@cobblefield.example");
  dana = await signInStaff(ctx, "dana@cobblefield.example");
  ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
});

afterAll(async () => {
  await ctx.close();
});

describe("the open-question queue", () => {
  it("puts questions with no answer after them first, then the oldest waiting first", async () => {
    const answered = await conversationWith([{ kind: "question", hoursAgo: 30 }, { kind: "answer", hoursAgo: 29 }]);
    const recent = await conversationWith([{ kind: "question", hoursAgo: 2 }]);
    // An answer to an earlier question does not answer this one.
    const older = await conversationWith([{ kind: "answer", hoursAgo: 12 }, { kind: "question", hoursAgo: 10 }]);

    const questions = await queue(marco);
    const mine = [answered.ids[0], recent.ids[0], older.ids[1]];
    const order = questions.map((q) => q.messageId).filter((id) => mine.includes(id));
    expect(order).toEqual([older.ids[1], recent.ids[0], answered.ids[0]]);

    // Across the whole queue: every unanswered question comes before every answered-but-open one.
    const isAnswered = (q: OpenQuestion) => q.lastAnsweredAt !== null && q.lastAnsweredAt > q.waitingSince;
    const firstAnswered = questions.findIndex(isAnswered);
    expect(questions.slice(firstAnswered).every(isAnswered)).toBe(true);
    const unanswered = questions.slice(0, firstAnswered).map((q) => q.waitingSince);
    expect(unanswered).toEqual([...unanswered].sort());

    const byId = new Map(questions.map((q) => [q.messageId, q]));
    const a = byId.get(answered.ids[0]!)!;
    expect(a.lastAnsweredAt).toBe(new Date(Date.parse(a.waitingSince) + HOUR).toISOString());
    expect(byId.get(recent.ids[0]!)!.lastAnsweredAt).toBeNull();
    expect(byId.get(older.ids[1]!)!.lastAnsweredAt! < byId.get(older.ids[1]!)!.waitingSince).toBe(true);
    expect(a).toMatchObject({ services: ["overseeding", "aeration"], assignedToId: null, assignedToName: null, askedAt: a.waitingSince });
  });

  it("says where the lawn is in its plan, counted in the plan's time zone", async () => {
    const owner = await customerByRef(ctx.db, "C-1001");
    const today = localDateAt(owner.timeZone);
    const visitDate = addDays(today, -10); // the visit day is day 1, so today is day 11
    const { planId, ids } = await conversationWith([{ kind: "question", hoursAgo: 1 }], { visitDate });
    const phases = [
      { phase: "prep", start: addDays(visitDate, -3), end: addDays(visitDate, -1) },
      { phase: "germination", start: visitDate, end: addDays(visitDate, 6) },
      { phase: "establishment", start: addDays(visitDate, 7), end: addDays(visitDate, 40) },
    ];
    await ctx.db("care_plans").where({ id: planId }).update({ figures: JSON.stringify({ meta: { phases } }) });

    const question = (await queue(dana)).find((q) => q.messageId === ids[0])!;
    expect(question.planDay).toEqual({ phase: "establishment", dayOfPhase: 4, dayOfPlan: 11 });
  });

  it("has no plan day before the visit, and no phase for a plan without phase ranges", async () => {
    const owner = await customerByRef(ctx.db, "C-1001");
    const { ids } = await conversationWith([{ kind: "question", hoursAgo: 1 }], { visitDate: addDays(localDateAt(owner.timeZone), 3) });
    const question = (await queue(dana)).find((q) => q.messageId === ids[0])!;
    expect(question.planDay).toEqual({ phase: null, dayOfPhase: null, dayOfPlan: null });
  });
});

describe("assigning a question", () => {
  let questionId: number;
  beforeAll(async () => {
    questionId = (await conversationWith([{ kind: "question", hoursAgo: 1 }])).ids[0]!;
  });
  const assign = (agent: Agent, id: number, userId: number | null) => agent.post(`/api/questions/${id}/assign`).send({ userId });

  it("lets a technician take a question and let it go again", async () => {
    const res = await assign(marco, questionId, staffIds.marco).expect(200);
    const { name } = (await ctx.db("users").where({ id: staffIds.marco }).first<{ name: string }>("name"))!;
    expect(res.body).toEqual({ messageId: questionId, assignedToId: staffIds.marco, assignedToName: name });
    const listed = (await queue(marco)).find((q) => q.messageId === questionId)!;
    expect(listed).toMatchObject({ assignedToId: staffIds.marco, assignedToName: name });

    await assign(marco, questionId, null).expect(200);
    expect((await queue(marco)).find((q) => q.messageId === questionId)!.assignedToId).toBeNull();
  });

  it("refuses a technician assigning someone else, or unassigning a colleague's question", async () => {
    await assign(marco, questionId, staffIds.dana).expect(403);
    await assign(dana, questionId, staffIds.priya).expect(200);
    await assign(marco, questionId, null).expect(403);
    // Taking it for themselves is allowed.
    await assign(marco, questionId, staffIds.marco).expect(200);
  });

  it("lets a manager assign to any active staff member of the company, and records it", async () => {
    const res = await assign(dana, questionId, staffIds.dana).expect(200);
    expect(res.body.assignedToId).toBe(staffIds.dana);
    // The audit entry is written once the response has finished.
    await expect.poll(async () => {
      const [row] = await ctx.db("audit_log").where({ action: "question.assigned", subject_id: String(questionId) }).count<{ count: string }[]>("* as count");
      return Number(row!.count);
    }).toBeGreaterThan(0);
  });

  it("answers 400 with a field error for a customer, an inactive or an unknown user", async () => {
    for (const id of [staffIds.ruth, staffIds.inactive, 2_000_000_000]) {
      const res = await assign(dana, questionId, id).expect(400);
      expect(res.body.error.fields).toHaveProperty("userId");
    }
    const bad = await dana.post(`/api/questions/${questionId}/assign`).send({ userId: "nobody" }).expect(400);
    expect(bad.body.error.fields).toHaveProperty("userId");
  });

  it("refuses customers, and hides unknown, resolved and other companies' questions", async () => {
    await assign(ruth, questionId, null).expect(403);
    await assign(dana, 999_999_999, null).expect(404);
    await assign(dana, await otherCompanyQuestion(), null).expect(404);
    const resolved = (await conversationWith([{ kind: "question", hoursAgo: 3 }])).ids[0]!;
    await ctx.db("messages").where({ id: resolved }).update({ resolved_at: new Date() });
    await assign(marco, resolved, staffIds.marco).expect(404);
  });
});
