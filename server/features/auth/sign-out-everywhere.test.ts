import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, forgetSignInRequests, freshIp, signInCustomer, signInStaff, tokenFromLink, waitForMessage, type TestContext } from "../../test/harness.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());
beforeEach(async () => forgetSignInRequests(ctx));

const ruth = "ruth.okonkwo@mail.example"; // seeded homeowner

/** Asks for a link and returns its token without using it. */
async function unusedLinkToken(contact: string): Promise<string> {
  await ctx.fakes.clearOutbox();
  await request(ctx.app).post("/api/auth/link").set("X-Forwarded-For", freshIp()).send({ contact }).expect(202);
  const message = await waitForMessage(ctx.fakes, contact);
  return tokenFromLink(message.links.find((l) => l.includes("/portal/sign-in/verify"))!);
}

describe("sign out everywhere", () => {
  it("ends both of a homeowner's sessions, including the one that asked", async () => {
    const phone = await signInCustomer(ctx, ruth);
    const laptop = await signInCustomer(ctx, ruth);
    await phone.get("/api/me").expect(200);
    await laptop.get("/api/me").expect(200);

    const res = await phone.post("/api/auth/sign-out-everywhere").expect(204);
    expect(String(res.headers["set-cookie"] ?? "")).toMatch(/sproutline\.sid=;/);

    expect((await phone.get("/api/me")).status).toBe(401);
    expect((await laptop.get("/api/me")).status).toBe(401);
  });

  it("also retires a sign-in link the homeowner asked for but never used", async () => {
    const session = await signInCustomer(ctx, ruth);
    const token = await unusedLinkToken(ruth);
    await session.post("/api/auth/sign-out-everywhere").expect(204);
    const consumed = await request(ctx.app).post("/api/auth/link/consume").send({ token });
    expect(consumed.status).toBe(410);
    expect(consumed.body.error.code).toBe("link_expired");
  });

  it("ends a staff member's sessions only, and the audit log records it", async () => {
    const office = await signInStaff(ctx, "marco@cobblefield.example");
    const truck = await signInStaff(ctx, "marco@cobblefield.example");
    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    const homeowner = await signInCustomer(ctx, ruth);
    const startedAfter = Number((await ctx.db("audit_log").max<{ max: string | null }[]>("id as max"))[0]!.max ?? 0);

    await truck.post("/api/auth/sign-out-everywhere").expect(204);

    expect((await office.get("/api/me")).status).toBe(401);
    expect((await truck.get("/api/me")).status).toBe(401);
    // Other people's sessions are untouched.
    await manager.get("/api/me").expect(200);
    await homeowner.get("/api/me").expect(200);

    // The audit entry is written when the answer has gone out.
    const deadline = Date.now() + 3000;
    let rows: { action: string; actor_user_id: number }[] = [];
    while (Date.now() < deadline && rows.length === 0) {
      rows = await ctx.db("audit_log").where("id", ">", startedAfter).andWhere({ action: "account.signed_out_everywhere" });
      if (!rows.length) await new Promise((r) => setTimeout(r, 50));
    }
    const marco = await ctx.db("users").where({ email: "marco@cobblefield.example" }).first<{ id: number }>("id");
    expect(rows.map((r) => r.actor_user_id)).toEqual([marco!.id]);
  });

  it("answers 401 to someone signed out", async () => {
    expect((await request(ctx.app).post("/api/auth/sign-out-everywhere")).status).toBe(401);
  });
});

describe("a new sign-in link retires older unused ones", () => {
  it("only the newest link signs in", async () => {
    const older = await unusedLinkToken(ruth);
    const newer = await unusedLinkToken(ruth);
    const first = await request(ctx.app).post("/api/auth/link/consume").send({ token: older });
    expect(first.status).toBe(410);
    expect(first.body.error.code).toBe("link_expired");
    await request(ctx.app).post("/api/auth/link/consume").send({ token: newer }).expect(200);
  });
});
