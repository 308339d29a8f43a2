import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { createCustomerWithPlan, freshPhone } from "../reminders/testing/fixtures.ts";

let ctx: TestContext;
let companyId: number;

beforeAll(async () => {
  ctx = await createTestContext();
  companyId = (await ctx.db("companies").where({ slug: "cobblefield" }).first("id")).id;
});
afterAll(async () => ctx.close());

async function keep(row: { sender: string; body: string; channel?: "sms" | "email"; company?: number | null; minutesAgo?: number }): Promise<number> {
  const [inserted] = await ctx
    .db("unmatched_inbound")
    .insert({
      company_id: row.company === undefined ? companyId : row.company,
      channel: row.channel ?? "sms",
      sender: row.sender,
      body: row.body,
      received_at: ctx.db.raw("now() - make_interval(mins => ?)", [row.minutesAgo ?? 0]),
    })
    .returning<{ id: string }[]>("id");
  return Number(inserted!.id);
}

describe("unmatched texts and e-mails for managers", () => {
  it("lists the company's open ones newest first, names a known customer, and marks one handled once", async () => {
    const stranger = freshPhone();
    const older = await keep({ sender: stranger, body: "Are you the lawn people?", minutesAgo: 30 });
    const newer = await keep({ sender: `someone-${Date.now()}@mail.example`, channel: "email", body: "Please call me" });
    const known = await createCustomerWithPlan(ctx.db, { timeZone: "America/New_York", steps: [], name: "Robin Tester" });
    const fromCustomer = await keep({ sender: known.phone!, body: "Plan ended, can you come back?", minutesAgo: 60 });
    const [elsewhere] = await ctx.db("companies").insert({ name: "Other Lawns", slug: `other-${Date.now()}`, time_zone: "America/Chicago", sms_sender_name: "Other" }).returning<{ id: number }[]>("id");
    const notOurs = await keep({ sender: stranger, body: "to another company", company: elsewhere!.id });

    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    const list = (await manager.get("/api/unmatched-inbound").expect(200)).body.items as { id: number; body: string; channel: string; customer: { name: string } | null; handledAt: string | null; handledByName: string | null }[];
    const ids = list.map((i) => i.id);
    expect(ids.indexOf(newer)).toBeLessThan(ids.indexOf(older));
    expect(list.find((i) => i.id === older)).toMatchObject({ channel: "sms", body: "Are you the lawn people?", customer: null, handledAt: null });
    expect(list.find((i) => i.id === fromCustomer)!.customer).toEqual({ id: known.customerId, name: "Robin Tester" });
    expect(ids).not.toContain(notOurs);

    const handled = (await manager.post(`/api/unmatched-inbound/${older}/handled`).expect(200)).body.item;
    expect(handled).toMatchObject({ id: older, handledByName: expect.any(String) });
    expect(handled.handledAt).not.toBeNull();
    const again = (await manager.post(`/api/unmatched-inbound/${older}/handled`).expect(200)).body.item;
    expect(again.handledAt).toBe(handled.handledAt);
    // Handled ones go after the open ones.
    const after = ((await manager.get("/api/unmatched-inbound").expect(200)).body.items as { id: number }[]).map((i) => i.id);
    expect(after.indexOf(older)).toBeGreaterThan(after.indexOf(newer));

    await manager.post(`/api/unmatched-inbound/${notOurs}/handled`).expect(404);
    await manager.post("/api/unmatched-inbound/999999999/handled").expect(404);
    const technician = await signInStaff(ctx, "marco@cobblefield.example");
    await technician.get("/api/unmatched-inbound").expect(403);
  });
});
