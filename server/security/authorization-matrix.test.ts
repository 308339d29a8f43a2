import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../test/harness.ts";
import { collectRoutes } from "../routes.ts";
import { createMessenger } from "../messaging/create-messenger.ts";
import { authorizationMatrix, type Caller, type Outcome } from "./authorization-matrix.ts";
import { smallWebp } from "../features/photos/testing/images.ts";

type Agent = ReturnType<typeof request.agent>;
let ctx: TestContext;
const agents = {} as Record<Caller, Agent>;
/** Ids of records that belong to the "own" customer (Ruth) and to another one (Tomasz). */
const records = { own: {} as Record<string, number>, other: {} as Record<string, number> };

async function recordsOf(ref: string) {
  const property = await ctx.db("properties").join("customers", "customers.id", "properties.customer_id").where("customers.external_ref", ref).first<{ id: number }>("properties.id");
  const plan = await ctx.db("care_plans").where({ property_id: property!.id }).orderBy("id").first<{ id: number; visit_id: number }>("id", "visit_id");
  const step = await ctx.db("plan_steps").where({ plan_id: plan!.id }).orderBy("id").first<{ id: number }>("id");
  return { id: property!.id, planId: plan!.id, stepId: Number(step!.id), visitId: plan!.visit_id };
}

/**
 * Staff-only records whose path id is not a property, keyed "<path segment>:<param>". Each
 * is harmless to hit as a manager: the saved reply is a throwaway one (DELETE removes it),
 * the place is a throwaway one too, the user is the manager themselves (deactivating the only manager answers 409), and the
 * question is Ruth's own, unassigned by the call.
 */
const staffRecordIds: Record<string, number> = {};
async function makeStaffRecords() {
  const ruth = await ctx.db("customers").where({ external_ref: "C-1001" }).first<{ id: number; company_id: number }>("id", "company_id");
  const manager = await ctx.db("users").where({ email: "dana@cobblefield.example" }).first<{ id: number }>("id");
  const [followUp] = await ctx.db("follow_up_visits").insert({ property_id: records.own.id, plan_id: records.own.planId, reason: "other", created_by: manager!.id }).returning<{ id: number }[]>("id");
  // A booked visit of each homeowner, for the homeowner's answers to a visit.
  const bookedVisit = (r: Record<string, number>) => ({ property_id: r.id, plan_id: r.planId, reason: "other", status: "scheduled", scheduled_for: "2026-12-20", technician_id: manager!.id, created_by: manager!.id });
  const [ownVisit] = await ctx.db("follow_up_visits").insert(bookedVisit(records.own)).returning<{ id: number }[]>("id");
  const [otherVisit] = await ctx.db("follow_up_visits").insert(bookedVisit(records.other)).returning<{ id: number }[]>("id");
  records.own.visitAnswerId = ownVisit!.id;
  records.other.visitAnswerId = otherVisit!.id;
  const [reply] = await ctx.db("saved_replies").insert({ company_id: ruth!.company_id, title: `matrix ${Date.now()}`, body: "Hello {{firstName}}" }).returning<{ id: number }[]>("id");
  // A stranger's text, kept for managers; marking it handled twice is harmless.
  const [unmatched] = await ctx.db("unmatched_inbound").insert({ company_id: ruth!.company_id, channel: "sms", sender: "+13305550177", body: "matrix" }).returning<{ id: string }[]>("id");
  // A throwaway place (DELETE removes it).
  const [place] = await ctx.db("place_rules").insert({ company_id: ruth!.company_id, name: `matrix ${Date.now()}`, region: "ZZ", rules: JSON.stringify({ fertilizerBlackouts: [], phosphorus: "allowed" }) }).returning<{ id: number }[]>("id");
  const [batch] = await ctx.db("import_batches").insert({ company_id: ruth!.company_id, file_sha256: `matrix ${Date.now()}` }).returning<{ id: number }[]>("id");
  // Ruth's open question (asked in photoOf); assigning it to nobody changes nothing.
  const question = await ctx.db("messages").join("conversations", "conversations.id", "messages.conversation_id")
    .where({ "conversations.plan_id": records.own.planId, "messages.kind": "question" }).whereNull("messages.resolved_at").orderBy("messages.id").first<{ id: string }>("messages.id");
  Object.assign(staffRecordIds, { "companies:companyId": ruth!.company_id, "questions:messageId": Number(question!.id), "follow-ups:id": followUp!.id, "customers:id": ruth!.id, "saved-replies:id": reply!.id, "team:userId": manager!.id, "visit-imports:batchId": batch!.id, "unmatched-inbound:id": Number(unmatched!.id), "place-rules:id": place!.id });
}

/** Each homeowner asks a question with one photo, so photo routes have a record of each. */
async function photoOf(agent: Agent, planId: number): Promise<number> {
  const res = await agent.post(`/api/plans/${planId}/questions`).field("text", "Is this normal?").attach("photos", await smallWebp(), "lawn.webp").expect(201);
  return res.body.message.photos[0].id;
}

beforeAll(async () => {
  ctx = await createTestContext();
  records.own = await recordsOf("C-1001");
  records.other = await recordsOf("C-1002");
  records.own.photoId = await photoOf(await signInCustomer(ctx, "ruth.okonkwo@mail.example"), records.own.planId!);
  records.other.photoId = await photoOf(await signInCustomer(ctx, "tomasz.brandt@mail.example"), records.other.planId!);
  await makeStaffRecords();
  agents.signedOut = request.agent(ctx.app);
  agents.customerOwn = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
  agents.customerOther = await signInCustomer(ctx, "ruth.okonkwo@mail.example"); // the same homeowner, aimed at Tomasz's records
  agents.technician = await signInStaff(ctx, "marco@cobblefield.example");
  agents.manager = await signInStaff(ctx, "dana@cobblefield.example");
  agents.deactivated = await signInStaff(ctx, "priya@cobblefield.example");
  // The public logo route has something to serve.
  await agents.manager.post("/api/company/logo").attach("logo", await smallWebp(), "logo.webp").expect(200);
  await ctx.db("users").where({ email: "priya@cobblefield.example" }).update({ active: false });
});
afterAll(async () => {
  await ctx.db("users").where({ email: "priya@cobblefield.example" }).update({ active: true });
  await ctx.close();
});

const routeTable = () =>
  collectRoutes({ config: ctx.config, db: ctx.db, messenger: createMessenger(ctx.config), log: () => {} }).map((r) => `${r.method.toUpperCase()} ${r.path}`);

function fillPath(path: string, caller: Caller): string {
  const ids = caller === "customerOther" ? records.other : records.own;
  const idFor = (name: string): string | number => {
    if (name === "size") return "thumb";
    if (name === "file") return "not-a-real-token.ics";
    // The homeowner's answers to a visit: their own visit, or the other homeowner's.
    if (name === "id" && /^\/api\/follow-ups\/:id\/(confirm|another-day)$/.test(path)) return ids.visitAnswerId!;
    const staffRecord = staffRecordIds[`${path.split("/")[2]}:${name}`];
    if (staffRecord !== undefined) return staffRecord;
    // :id is a property unless the path names another kind of record.
    if (name === "id" && path.startsWith("/api/visits/")) return ids.visitId!;
    if (name === "id" && path.startsWith("/api/photos/")) return ids.photoId!;
    return ids[name]!;
  };
  return path.replace(/:(\w+)/g, (_m, name: string) => String(idFor(name)));
}

/** Valid bodies where validation would otherwise answer 400 before ownership is checked. */
const sampleBodies: Record<string, unknown> = {
  "PUT /api/plans/:planId/steps/:stepId/state": { state: "done" },
  "POST /api/plans/:planId/observations": { kind: "sprouts_seen", onDay: 5 },
  "POST /api/questions/:messageId/assign": { userId: null },
};

function matches(outcome: Outcome, status: number): boolean {
  if (outcome === "ok") return status < 500 && ![401, 403, 404].includes(status);
  return status === outcome;
}

describe("authorization matrix, generated from the route table", () => {
  it("has an entry for every route and no entry for a route that no longer exists", () => {
    const routes = routeTable();
    expect(routes.filter((r) => !(r in authorizationMatrix))).toEqual([]);
    expect(Object.keys(authorizationMatrix).filter((k) => !routes.includes(k))).toEqual([]);
  });

  const callers: Caller[] = ["signedOut", "customerOwn", "customerOther", "technician", "manager", "deactivated"];
  it("answers every route as the matrix says for every kind of caller", async () => {
    // Sign-out last (everywhere first, while the session still lives): they end the session the other rows need.
    const signOutRank = (key: string) => (key.endsWith("/sign-out") ? 2 : key.includes("/sign-out") ? 1 : 0);
    const routes = routeTable().sort((a, b) => signOutRank(a) - signOutRank(b));
    const mismatches: string[] = [];
    for (const caller of callers) {
      // customerOwn's "sign out everywhere" ended this same homeowner's other session too.
      if (caller === "customerOther") agents.customerOther = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
      for (const key of routes) {
        const [method, path] = key.split(" ") as [string, string];
        const url = fillPath(path, caller);
        const agent = agents[caller];
        const req = agent[method.toLowerCase() as "get"](url).set("X-Forwarded-For", "192.0.2.10");
        const res = method === "GET" ? await req : await req.send(sampleBodies[key] ?? {});
        const expected = authorizationMatrix[key]![caller];
        if (!matches(expected, res.status)) mismatches.push(`${caller} ${method} ${url}: expected ${expected}, got ${res.status}`);
      }
    }
    expect(mismatches).toEqual([]);
  });
});
