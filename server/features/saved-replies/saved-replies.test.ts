import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { fillPlaceholders, unknownPlaceholders } from "#shared/schemas/saved-replies";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { createCustomer, createHandMadePlan, createIsolatedCompany, createVisit } from "../follow-ups/testing/isolated-company.ts";
import { spokenDate } from "./service.ts";

type Agent = ReturnType<typeof request.agent>;
let ctx: TestContext;
let dana: Agent;
let marco: Agent;
let ruthPlanId: number;
let ruthPlan: { visitDate: string; firstMowDate: string | null };
let otherCompanyPlanId: number;
let otherCompanyId: number;
const title = (t: string) => `${t} ${Date.now()}`;

beforeAll(async () => {
  ctx = await createTestContext();
  dana = await signInStaff(ctx, "dana@cobblefield.example");
  marco = await signInStaff(ctx, "marco@cobblefield.example");
  const plan = await ctx.db("care_plans as cp")
    .join("properties as p", "p.id", "cp.property_id").join("customers as c", "c.id", "p.customer_id").join("service_visits as v", "v.id", "cp.visit_id")
    .where("c.external_ref", "C-1001").orderBy("cp.id")
    .first<{ id: number; visit_date: string; first_mow: string | null }>("cp.id", "v.visit_date", ctx.db.raw("cp.figures -> 'meta' ->> 'firstMowDate' as first_mow"));
  ruthPlanId = plan!.id;
  ruthPlan = { visitDate: plan!.visit_date, firstMowDate: plan!.first_mow };
  const other = await createIsolatedCompany(ctx.db, `replies-${Date.now()}`, []);
  otherCompanyId = other.companyId;
  const customer = await createCustomer(ctx.db, other.companyId, { first: "Olga", last: "Other" });
  otherCompanyPlanId = await createHandMadePlan(ctx.db, customer.propertyId, await createVisit(ctx.db, customer.propertyId, null, "2026-09-01", ["overseeding"]), []);
});
afterAll(async () => ctx.close());

describe("placeholders", () => {
  it("fills known placeholders and leaves unknown ones as typed", () => {
    const values = { firstName: "Ruth", visitDate: "Tuesday, September 8", firstMowDate: "Friday, October 2", companyName: "Cobblefield" };
    expect(fillPlaceholders("Hi {{firstName}}, mow on {{ firstMowDate }}. {{firstname}}", values)).toBe("Hi Ruth, mow on Friday, October 2. {{firstname}}");
    expect(unknownPlaceholders("{{firstName}} {{firstname}} {{lawnSize}} {{lawnSize}}")).toEqual(["firstname", "lawnSize"]);
    expect(spokenDate("2026-09-08")).toBe("Tuesday, September 8");
  });
});

describe("saved replies", () => {
  it("are kept by the manager and used by technicians", async () => {
    const created = await dana.post("/api/saved-replies").send({ title: title("Mowing"), body: "Hi {{firstName}}, first mow on {{firstMowDate}}." }).expect(201);
    const id = created.body.reply.id;
    expect(created.body.reply.createdByName).toBe("Dana Whitlow");
    const list = await marco.get("/api/saved-replies").expect(200);
    expect(list.body.replies.map((r: { id: number }) => r.id)).toContain(id);

    await marco.post("/api/saved-replies").send({ title: title("Nope"), body: "x" }).expect(403);
    await marco.put(`/api/saved-replies/${id}`).send({ title: "x", body: "x" }).expect(403);
    await marco.delete(`/api/saved-replies/${id}`).expect(403);

    const updated = await dana.put(`/api/saved-replies/${id}`).send({ title: title("Mowing"), body: "Hello {{firstName}} from {{companyName}}" }).expect(200);
    expect(updated.body.reply.body).toBe("Hello {{firstName}} from {{companyName}}");
    await dana.delete(`/api/saved-replies/${id}`).expect(204);
    await dana.delete(`/api/saved-replies/${id}`).expect(404);
  });

  it("refuses unknown placeholders and a title used twice", async () => {
    const bad = await dana.post("/api/saved-replies").send({ title: title("Typo"), body: "Hi {{firstname}}" }).expect(400);
    expect(bad.body.error.fields.body).toMatch(/\{\{firstname\}\}/);
    const t = title("Twice");
    await dana.post("/api/saved-replies").send({ title: t, body: "One" }).expect(201);
    const twice = await dana.post("/api/saved-replies").send({ title: t, body: "Two" }).expect(409);
    expect(twice.body.error.fields.title).toBeDefined();
  });

  it("renders a reply for a customer's plan", async () => {
    const created = await dana.post("/api/saved-replies").send({ title: title("Render"), body: "Hi {{firstName}}! Seeded {{visitDate}}, mow {{firstMowDate}}. — {{companyName}}" }).expect(201);
    const res = await marco.post(`/api/saved-replies/${created.body.reply.id}/render`).send({ planId: ruthPlanId }).expect(200);
    const mow = ruthPlan.firstMowDate ? spokenDate(ruthPlan.firstMowDate) : "(date to be confirmed)";
    expect(res.body.text).toBe(`Hi Ruth! Seeded ${spokenDate(ruthPlan.visitDate)}, mow ${mow}. — Cobblefield Turf Care`);
    expect(res.body.missing).toEqual(ruthPlan.firstMowDate ? [] : ["firstMowDate"]);
    expect(res.body.speciesNotInLawn).toEqual([]);
  });

  it("names the grasses a reply mentions that the plan's lawn and seed mix don't have", async () => {
    // Ruth's lawn is tall fescue, overseeded with tall fescue (seeds/data/demo-company.ts).
    const body = "Hi {{firstName}}, your tall fescue and bluegrass are up. Bermuda grass and zoysia wait for summer.";
    const created = await dana.post("/api/saved-replies").send({ title: title("Grasses"), body }).expect(201);
    const res = await marco.post(`/api/saved-replies/${created.body.reply.id}/render`).send({ planId: ruthPlanId }).expect(200);
    expect(res.body.speciesNotInLawn).toEqual(["kentucky_bluegrass", "bermudagrass", "zoysiagrass"]);
    expect(res.body.text).toMatch(/^Hi Ruth, your tall fescue/);
  });

  it("answers 404 for another company's plan or reply, and 403 to customers", async () => {
    const created = await dana.post("/api/saved-replies").send({ title: title("Scoped"), body: "Hi {{firstName}}" }).expect(201);
    await marco.post(`/api/saved-replies/${created.body.reply.id}/render`).send({ planId: otherCompanyPlanId }).expect(404);
    const otherReply = await ctx.db("saved_replies").insert({ company_id: otherCompanyId, title: "Theirs", body: "x" }).returning<{ id: number }[]>("id");
    await marco.post(`/api/saved-replies/${otherReply[0]!.id}/render`).send({ planId: ruthPlanId }).expect(404);
    await dana.put(`/api/saved-replies/${otherReply[0]!.id}`).send({ title: "Mine now", body: "x" }).expect(404);
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await ruth.get("/api/saved-replies").expect(403);
    await ruth.post(`/api/saved-replies/${created.body.reply.id}/render`).send({ planId: ruthPlanId }).expect(403);
  });

  it("seeds the demo company's replies", async () => {
    const list = await marco.get("/api/saved-replies").expect(200);
    expect(list.body.replies.map((r: { title: string }) => r.title)).toEqual(expect.arrayContaining(["When to mow", "Patchy sprouting is normal", "Booking a return visit"]));
  });
});
