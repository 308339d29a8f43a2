import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  // Later test files expect the seeded program.
  await ctx.db("program_settings").where("version", ">", 1).delete();
  await ctx.close();
});

describe("saving the care program as a new version", () => {
  it("creates the next version, which new plans use, while existing plans keep theirs", async () => {
    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    const before = (await manager.get("/api/programs/current").expect(200)).body;
    const existingPlan = await ctx.db("care_plans").orderBy("id").first<{ id: number; program_version: number }>("id", "program_version");

    const saved = await manager
      .post("/api/programs")
      .send({ settings: { ...before.settings, germinationDays: 21 }, basedOnVersion: before.version })
      .expect(201);
    expect(saved.body.version).toBe(before.version + 1);
    expect(saved.body.settings.germinationDays).toBe(21);
    expect((await manager.get("/api/programs/current").expect(200)).body.version).toBe(before.version + 1);

    const unchanged = await ctx.db("care_plans").where({ id: existingPlan!.id }).first<{ program_version: number }>("program_version");
    expect(unchanged!.program_version).toBe(existingPlan!.program_version);

    // A second manager's save from the old version is refused rather than silently overwriting.
    const stale = await manager.post("/api/programs").send({ settings: before.settings, basedOnVersion: before.version });
    expect(stale.status).toBe(409);
  });

  it("refuses settings outside the engine's safe bounds with field errors", async () => {
    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    const res = await manager.post("/api/programs").send({ settings: { firstMowMinDays: 7 } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields["settings.firstMowMinDays"]).toMatch(/at least 14/);
  });

  it("is for managers only", async () => {
    const technician = await signInStaff(ctx, "marco@cobblefield.example");
    await technician.post("/api/programs").send({ settings: {} }).expect(403);
  });
});
