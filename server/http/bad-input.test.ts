import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { NUL_MESSAGE } from "#shared/schemas/text";
import { DATE_RANGE_MESSAGE } from "#shared/engine/schemas/common";
import { createTestContext, signInStaff, type TestContext } from "../test/harness.ts";

/**
 * Input PostgreSQL cannot store (NUL characters, year 0000) is refused at the boundary with the
 * usual 400 and a field error, instead of reaching a query and failing it with a 500.
 */
type Agent = Awaited<ReturnType<typeof signInStaff>>;
let ctx: TestContext;
let manager: Agent;
let propertyId: number;

beforeAll(async () => {
  ctx = await createTestContext();
  manager = await signInStaff(ctx, "dana@cobblefield.example");
  const property = await ctx.db("properties").join("customers", "customers.id", "properties.customer_id")
    .where("customers.external_ref", "C-1001").first<{ id: number }>("properties.id");
  propertyId = property!.id;
});
afterAll(async () => ctx.close());

describe("NUL characters", () => {
  it("in a query string: 400 naming the parameter", async () => {
    const res = await manager.get("/api/customers").query({ q: "Ruth\u0000" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ "query.q": NUL_MESSAGE });
  });

  it("in JSON text: 400 naming the field, nothing stored", async () => {
    const before = await ctx.db("saved_replies").count<{ count: string }[]>({ count: "*" });
    const res = await manager.post("/api/saved-replies").send({ title: "Frost", body: "Cover the\u0000 seed" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ body: NUL_MESSAGE });
    expect(await ctx.db("saved_replies").count<{ count: string }[]>({ count: "*" })).toEqual(before);
  });

  it("deep in a body, in an object key, and in a path parameter", async () => {
    const nested = await manager.post("/api/follow-ups").send({ propertyId, reason: "other", customerPrep: "ok", extra: { list: ["a", "b\u0000"] } });
    expect(nested.status).toBe(400);
    expect(nested.body.error.fields).toEqual({ "extra.list.1": NUL_MESSAGE });
    const key = await manager.post("/api/saved-replies").send({ title: "Frost", body: "Cover it", "odd\u0000": 1 });
    expect(key.status).toBe(400);
    expect(Object.values(key.body.error.fields)).toEqual([NUL_MESSAGE]);
    const param = await manager.get("/api/customers/%00");
    expect(param.status).toBe(400);
    expect(param.body.error.fields).toEqual({ "params.id": NUL_MESSAGE });
  });
});

describe("dates outside 1900–2199", () => {
  it.each(["/api/follow-ups", "/api/follow-ups.csv", "/api/reports/callbacks"])("%s refuses year 0000 and 9999 filters", async (path) => {
    for (const [name, value] of [["from", "0000-01-01"], ["to", "9999-12-31"]] as const) {
      const res = await manager.get(path).query({ [name]: value });
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toEqual({ [`query.${name}`]: DATE_RANGE_MESSAGE });
    }
    await manager.get(path).query({ from: "2026-01-01", to: "2026-12-31" }).expect(200);
  });

  it("creating or moving a follow-up refuses year 0000", async () => {
    const res = await manager.post("/api/follow-ups").send({ propertyId, reason: "other", scheduledFor: "0000-03-01" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ scheduledFor: DATE_RANGE_MESSAGE });
    const created = await manager.post("/api/follow-ups").send({ propertyId, reason: "other", scheduledFor: "2026-10-02" });
    expect(created.status).toBe(201);
    const moved = await manager.patch(`/api/follow-ups/${created.body.followUp.id}`).send({ scheduledFor: "0000-10-02" });
    expect(moved.status).toBe(400);
    expect(moved.body.error.fields).toEqual({ scheduledFor: DATE_RANGE_MESSAGE });
  });
});
