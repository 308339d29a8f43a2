import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { addDays } from "#shared/engine/dates";
import { threadResponseSchema, type ThreadMessage } from "#shared/schemas/questions";
import { openQuestionsResponseSchema } from "#shared/schemas/question-queue";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { createLocalDiskStorage } from "../../storage/local-disk-storage.ts";
import { smallWebp } from "../photos/testing/images.ts";
import { findPlanForUser } from "../plans/access.ts";
import { findActiveUserById } from "../../auth/users-repo.ts";
import { askQuestion } from "./service.ts";
import { localDateAt } from "./local-time.ts";
import { createPlanFixture, customerByRef } from "./testing/plan-fixture.ts";

type Agent = ReturnType<typeof request.agent>;

let ctx: TestContext;
let photoDir: string;
let ruth: Agent;
let tomasz: Agent;
let marco: Agent;
let dana: Agent;
let planId: number;
const today = localDateAt("America/New_York", new Date());

async function thread(agent: Agent, id = planId): Promise<ThreadMessage[]> {
  const res = await agent.get(`/api/plans/${id}/thread`).expect(200);
  return threadResponseSchema.parse(res.body).messages;
}

beforeAll(async () => {
  photoDir = await mkdtemp(join(tmpdir(), "sproutline-thread-"));
  ctx = await createTestContext({ PHOTO_DIR: photoDir });
  ({ planId } = await createPlanFixture(ctx.db, {
    customerRef: "C-1001",
    steps: [
      { key: "check-in-1", date: addDays(today, -1), kind: "check_in_photo", title: "Send a check-in photo", content: { detail: "Stand where you stood for the first one." } },
      { key: "check-in-2", date: addDays(today, 3), kind: "check_in_photo", title: "Send another check-in photo" },
      { key: `water-${today}`, date: today, kind: "water", title: "Water 3 times", content: { times: ["06:00", "12:00", "17:00"], minutesPerCycle: 6 } },
    ],
  }));
  ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
  tomasz = await signInCustomer(ctx, "tomasz.brandt@mail.example");
  marco = await signInStaff(ctx, "marco@cobblefield.example");
  dana = await signInStaff(ctx, "dana@cobblefield.example");
});

afterAll(async () => {
  await ctx.close();
  await rm(photoDir, { recursive: true, force: true });
});

describe("a plan's thread", () => {
  it("shows due check-in requests from the plan (not future ones), unread once for the customer", async () => {
    const first = await thread(ruth);
    expect(first).toHaveLength(1);
    expect(first[0]).toMatchObject({ kind: "check_in_request", authorRole: "system", authorName: "Cobblefield Turf Care", unread: true, photos: [] });
    expect(first[0]!.id).toBeLessThan(0);
    expect(first[0]!.text).toContain("Stand where you stood");
    expect((await thread(ruth))[0]!.unread).toBe(false);
  });

  it("a question lands unread for staff, and reading it clears that for all staff", async () => {
    await ruth.post(`/api/plans/${planId}/questions`).field("text", "The new grass looks yellow at the tips. Is this normal?").attach("photos", await smallWebp(), "tips.webp").expect(201);
    const forMarco = await thread(marco);
    const question = forMarco.find((m) => m.kind === "question")!;
    expect(question).toMatchObject({ authorRole: "customer", unread: true });
    expect(question.photos).toHaveLength(1);
    // System check-in requests are not something staff have to read.
    expect(forMarco.find((m) => m.kind === "check_in_request")!.unread).toBe(false);
    expect((await thread(dana)).find((m) => m.kind === "question")!.unread).toBe(false);
    // The customer's own question is never unread for her.
    expect((await thread(ruth)).find((m) => m.kind === "question")!.unread).toBe(false);
  });

  it("staff answer and resolve; the answer is unread for the customer until she reads it", async () => {
    const res = await marco.post(`/api/plans/${planId}/answers`).send({ text: "Yes, that's normal in week two. Keep watering.", resolve: true }).expect(201);
    expect(res.body.message).toMatchObject({ kind: "answer", authorRole: "technician", authorName: "Marco Ibsen", unread: false });

    const forRuth = await thread(ruth);
    expect(forRuth.map((m) => m.kind)).toEqual(["check_in_request", "question", "answer"]);
    expect(forRuth.at(-1)).toMatchObject({ kind: "answer", unread: true });
    expect((await thread(ruth)).at(-1)!.unread).toBe(false);

    const open = await ctx.db("messages").join("conversations", "conversations.id", "messages.conversation_id")
      .where({ "conversations.plan_id": planId, kind: "question" }).whereNull("resolved_at").count<{ count: string }[]>("* as count");
    expect(Number(open[0]!.count)).toBe(0);
  });

  it("an answer without resolve leaves new questions open", async () => {
    await ruth.post(`/api/plans/${planId}/questions`).send({ text: "And the bare patch by the fence?" }).expect(201);
    await dana.post(`/api/plans/${planId}/answers`).send({ text: "I'll look at it on Thursday." }).expect(201);
    const open = await ctx.db("messages").join("conversations", "conversations.id", "messages.conversation_id")
      .where({ "conversations.plan_id": planId, kind: "question" }).whereNull("resolved_at").count<{ count: string }[]>("* as count");
    expect(Number(open[0]!.count)).toBe(1);
  });

  it("open questions are in the staff queue, oldest first, overdue past the answer target", async () => {
    const res = await dana.get("/api/questions/open").expect(200);
    const queue = openQuestionsResponseSchema.parse(res.body).questions.filter((q) => q.planId === planId);
    expect(queue).toEqual([expect.objectContaining({ customerName: "Ruth Okonkwo", text: "And the bare patch by the fence?", photoCount: 0, thumbUrl: null, overdue: false })]);
    await ctx.db("messages").where({ id: queue[0]!.messageId }).update({ created_at: ctx.db.raw("now() - interval '25 hours'") });
    const later = openQuestionsResponseSchema.parse((await marco.get("/api/questions/open").expect(200)).body).questions;
    expect(later.find((q) => q.messageId === queue[0]!.messageId)!.overdue).toBe(true);
    await ruth.get("/api/questions/open").expect(403);
  });

  it("staff may attach one photo to an answer as multipart", async () => {
    const webp = await smallWebp();
    const res = await marco.post(`/api/plans/${planId}/answers`).field("text", "Like this one.").field("resolve", "true").attach("photos", webp, "ref.webp").expect(201);
    expect(res.body.message.photos).toHaveLength(1);
    await ruth.get(res.body.message.photos[0].url).expect(200);
    const two = await marco.post(`/api/plans/${planId}/answers`).field("text", "Two?").attach("photos", webp, "a.webp").attach("photos", webp, "b.webp").expect(400);
    expect(two.body.error.code).toBe("too_many_files");
  });

  it("staff-only notes (and their photos) never reach the customer", async () => {
    const conversation = await ctx.db("conversations").where({ plan_id: planId }).first("id");
    const marcoUser = await ctx.db("users").where({ email: "marco@cobblefield.example" }).first("id");
    await ctx.db("messages").insert({ conversation_id: conversation.id, kind: "note", author_user_id: marcoUser.id, text: "Customer mows too short." });
    expect((await thread(marco)).some((m) => m.kind === "note")).toBe(true);
    expect((await thread(ruth)).some((m) => m.kind === "note")).toBe(false);
  });
});

describe("who may reach a thread", () => {
  it("another customer gets 404 for the thread, the question and the answer route", async () => {
    const res = await tomasz.get(`/api/plans/${planId}/thread`).expect(404);
    expect(res.body.error.code).toBe("not_found");
    await tomasz.post(`/api/plans/${planId}/questions`).send({ text: "hello" }).expect(404);
    await tomasz.post(`/api/plans/${planId}/answers`).send({ text: "hello" }).expect(403);
  });

  it("customers cannot answer; staff cannot ask; signed out gets 401", async () => {
    await ruth.post(`/api/plans/${planId}/answers`).send({ text: "I answer myself" }).expect(403);
    await marco.post(`/api/plans/${planId}/questions`).send({ text: "?" }).expect(403);
    await request(ctx.app).get(`/api/plans/${planId}/thread`).expect(401);
    await request(ctx.app).post(`/api/plans/${planId}/questions`).attach("photos", Buffer.from("x"), "x.jpg").expect(401);
  });

  it("unknown and malformed plan ids", async () => {
    await marco.get("/api/plans/999999/thread").expect(404);
    await marco.get("/api/plans/abc/thread").expect(400);
    await ruth.post("/api/plans/abc/questions").send({ text: "hi" }).expect(400);
  });
});

describe("nothing half-saved", () => {
  it("when the database refuses the message, the photo files just written are removed", async () => {
    const owner = await customerByRef(ctx.db, "C-1001");
    const user = (await findActiveUserById(ctx.db, owner.userId))!;
    const plan = await findPlanForUser(ctx.db, user, planId);
    const storage = createLocalDiskStorage(photoDir);
    // A plan that no longer exists: the conversation insert fails its foreign key.
    await expect(askQuestion({ db: ctx.db, storage }, user, { ...plan, planId: 2_000_000_000 }, "hi", [await smallWebp()])).rejects.toThrow();
    const onDisk = (await readdir(photoDir, { recursive: true, withFileTypes: true }))
      .filter((f) => f.isFile())
      .map((f) => `${f.parentPath.slice(photoDir.length + 1)}/${f.name}`);
    const stored = (await ctx.db("photos").select<{ large_key: string; thumb_key: string }[]>("large_key", "thumb_key")).flatMap((r) => [r.large_key, r.thumb_key]);
    expect(onDisk.length).toBeGreaterThan(0);
    expect(onDisk.filter((key) => !stored.includes(key))).toEqual([]);
  });
});
