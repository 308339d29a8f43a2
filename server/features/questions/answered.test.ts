import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { answeredQuestionsResponseSchema } from "#shared/schemas/question-queue";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { createCustomer, createHandMadePlan, createIsolatedCompany, createVisit } from "../follow-ups/testing/isolated-company.ts";

type Agent = ReturnType<typeof request.agent>;
const HOUR = 3_600_000;

let ctx: TestContext;
let manager: Agent;
let stamp: number;
const ids: Record<string, number> = {};

async function newPlan(companyId: number, first: string) {
  const owner = await createCustomer(ctx.db, companyId, { first, last: "Lawn" });
  const visit = await createVisit(ctx.db, owner.propertyId, null, "2026-09-15", ["overseeding"]);
  const planId = await createHandMadePlan(ctx.db, owner.propertyId, visit, []);
  const [conversation] = await ctx.db("conversations").insert({ plan_id: planId }).returning<{ id: number }[]>("id");
  return { planId, conversationId: conversation!.id };
}

async function message(conversationId: number, kind: "question" | "answer", hoursAgo: number, authorId: number | null, text = `${kind} ${hoursAgo}`) {
  const [row] = await ctx.db("messages")
    .insert({ conversation_id: conversationId, kind, text, author_user_id: authorId, created_at: new Date(Date.now() - hoursAgo * HOUR) })
    .returning<{ id: string }[]>("id");
  return Number(row!.id);
}

beforeAll(async () => {
  ctx = await createTestContext();
  stamp = Date.now();
  const made = await createIsolatedCompany(ctx.db, `answered-${stamp}`, [
    { email: `boss-${stamp}@answered.example`, role: "manager", name: "Mae Manager" },
    { email: `tech-${stamp}@answered.example`, role: "technician", name: "Ted Tech" },
  ]);
  const boss = made.staffIds[`boss-${stamp}@answered.example`]!;
  const tech = made.staffIds[`tech-${stamp}@answered.example`]!;

  const a = await newPlan(made.companyId, "Ada");
  ids.yesterday = await message(a.conversationId, "question", 30, null);
  await message(a.conversationId, "answer", 26, tech, "Water twice a day for now.");
  // A later answer in the same thread does not change who answered first.
  await message(a.conversationId, "answer", 5, boss, "Following up.");
  await ctx.db("messages").where({ id: ids.yesterday }).update({ resolved_at: new Date(), resolved_by: tech });

  const b = await newPlan(made.companyId, "Ben");
  ids.anHourAgo = await message(b.conversationId, "question", 3, null);
  await message(b.conversationId, "answer", 1, boss, "That is crabgrass; leave it for now.");

  const c = await newPlan(made.companyId, "Cy");
  ids.unanswered = await message(c.conversationId, "question", 2, null);

  const d = await newPlan(made.companyId, "Dee");
  ids.tenDaysAgo = await message(d.conversationId, "question", 24 * 12, null);
  await message(d.conversationId, "answer", 24 * 10, tech);

  const other = await createIsolatedCompany(ctx.db, `answered-other-${stamp}`, [{ email: `other-${stamp}@answered.example`, role: "technician", name: "Oz" }]);
  const o = await newPlan(other.companyId, "Olu");
  ids.otherCompany = await message(o.conversationId, "question", 4, null);
  await message(o.conversationId, "answer", 2, other.staffIds[`other-${stamp}@answered.example`]!);

  manager = await signInStaff(ctx, `boss-${stamp}@answered.example`);
});

afterAll(async () => {
  await ctx.close();
});

describe("GET /api/questions/answered", () => {
  it("lists the company's questions answered in the last week, most recently answered first, with who answered first", async () => {
    const res = await manager.get("/api/questions/answered").expect(200);
    const body = answeredQuestionsResponseSchema.parse(res.body);
    expect(body.days).toBe(7);
    expect(body.questions.map((q) => q.messageId)).toEqual([ids.anHourAgo, ids.yesterday]);
    expect(body.questions[0]).toMatchObject({ customerName: "Ben Lawn", answeredByName: "Mae Manager", answerText: "That is crabgrass; leave it for now.", resolved: false });
    expect(body.questions[1]).toMatchObject({ customerName: "Ada Lawn", answeredByName: "Ted Tech", answerText: "Water twice a day for now.", resolved: true });
    expect(Date.parse(body.questions[0]!.answeredAt)).toBeGreaterThan(Date.parse(body.questions[1]!.answeredAt));
  });

  it("reaches further back when asked for more days", async () => {
    const res = await manager.get("/api/questions/answered?days=14").expect(200);
    const body = answeredQuestionsResponseSchema.parse(res.body);
    expect(body.questions.map((q) => q.messageId)).toEqual([ids.anHourAgo, ids.yesterday, ids.tenDaysAgo]);
  });

  it("refuses a window it does not offer", async () => {
    await manager.get("/api/questions/answered?days=0").expect(400);
    await manager.get("/api/questions/answered?days=90").expect(400);
  });
});
