import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

describe("audit log of staff reads and changes", () => {
  it("records a technician reading a customer's plan, shows it to managers, and not homeowners' own reads", async () => {
    const plan = await ctx.db("care_plans").orderBy("id").first<{ id: number }>("id");
    const startedAfter = Number((await ctx.db("audit_log").max<{ max: string | null }[]>("id as max"))[0]!.max ?? 0);
    const technician = await signInStaff(ctx, "marco@cobblefield.example");
    await technician.get(`/api/plans/${plan!.id}`).expect(200);
    await technician.get("/api/plans/999999").expect(404); // not a read: nothing recorded

    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await ruth.get(`/api/plans/${plan!.id}`);

    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    const deadline = Date.now() + 3000;
    let entries: { id: number; action: string; subjectId: string; actorName: string }[] = [];
    while (Date.now() < deadline) {
      const all: typeof entries = (await manager.get(`/api/audit?subjectType=plan&subjectId=${plan!.id}`).expect(200)).body.entries;
      entries = all.filter((e) => e.id > startedAfter);
      if (entries.length) break;
      await new Promise((r) => setTimeout(r, 50));
    }
    expect(entries).toHaveLength(1);
    expect(entries[0]).toMatchObject({ action: "plan.read", subjectId: String(plan!.id), actorName: "Marco Ibsen" });
    expect((await ctx.db("audit_log").where({ subject_id: "999999" })).length).toBe(0);

    await technician.get("/api/audit").expect(403);
  });
});
