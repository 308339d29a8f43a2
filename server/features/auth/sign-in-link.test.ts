import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, forgetSignInRequests, freshIp, signInCustomer, tokenFromLink, waitForMessage, type TestContext } from "../../test/harness.ts";
import { hashToken } from "./tokens.ts";
import { signInLimits } from "./service.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());
beforeEach(async () => forgetSignInRequests(ctx));

const ruth = "ruth.okonkwo@mail.example"; // seeded homeowner with e-mail and phone
const waltPhone = "+13305550114"; // seeded homeowner with a phone only

function requestLink(contact: string, ip = freshIp()) {
  return request(ctx.app).post("/api/auth/link").set("X-Forwarded-For", ip).send({ contact });
}

async function linkFor(contact: string) {
  await ctx.fakes.clearOutbox();
  await requestLink(contact).expect(202);
  const message = await waitForMessage(ctx.fakes, contact);
  return message.links.find((l) => l.includes("/portal/sign-in/verify"))!;
}

describe("one-time sign-in links", () => {
  it("e-mails a link that signs the homeowner in once", async () => {
    const link = await linkFor(ruth);
    expect(link).toMatch(/^http:\/\/localhost:5999\/portal\/sign-in\/verify\?token=[A-Za-z0-9_-]{43}$/);

    const agent = request.agent(ctx.app);
    const consumed = await agent.post("/api/auth/link/consume").send({ token: tokenFromLink(link) }).expect(200);
    expect(consumed.body.user).toMatchObject({ role: "customer", email: ruth, companyName: "Cobblefield Turf Care" });
    const me = await agent.get("/api/me").expect(200);
    expect(me.body.user.name).toBe("Ruth Okonkwo");

    const again = await request(ctx.app).post("/api/auth/link/consume").send({ token: tokenFromLink(link) });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe("link_used");
  });

  it("texts the link through the SMS gateway when a mobile number is given", async () => {
    await ctx.fakes.clearOutbox();
    await requestLink("(330) 555-0114").expect(202);
    const sms = await waitForMessage(ctx.fakes, waltPhone);
    expect(sms.channel).toBe("sms");
    expect(sms.text).toContain("Cobblefield Turf"); // names the sender (CTIA)
    expect(sms.links[0]).toContain("/portal/sign-in/verify?token=");
  });

  it("stores only a hash of the token", async () => {
    const token = tokenFromLink(await linkFor(ruth));
    const stored = await ctx.db("sign_in_tokens").where({ token_hash: hashToken(token) }).first();
    expect(stored).toBeDefined();
    const raw = await ctx.db("sign_in_tokens").where({ token_hash: token }).first();
    expect(raw).toBeUndefined();
  });

  it("refuses an expired link", async () => {
    const token = tokenFromLink(await linkFor(ruth));
    await ctx.db("sign_in_tokens").where({ token_hash: hashToken(token) }).update({ expires_at: ctx.db.raw("now() - interval '1 minute'") });
    const res = await request(ctx.app).post("/api/auth/link/consume").send({ token });
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe("link_expired");
  });

  it("refuses a made-up token and a malformed one", async () => {
    const madeUp = await request(ctx.app).post("/api/auth/link/consume").send({ token: "A".repeat(43) });
    expect(madeUp.status).toBe(400);
    expect(madeUp.body.error.code).toBe("link_invalid");
    const malformed = await request(ctx.app).post("/api/auth/link/consume").send({ token: "../../etc/passwd" });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields.token).toBeDefined();
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    await ctx.fakes.clearOutbox();
    const known = await requestLink(ruth);
    const unknown = await requestLink("nobody@nowhere.example");
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    await waitForMessage(ctx.fakes, ruth);
    expect((await ctx.fakes.listOutbox()).filter((m) => m.to === "nobody@nowhere.example")).toHaveLength(0);
  });

  it("does not send links to staff addresses (staff use Google)", async () => {
    await ctx.fakes.clearOutbox();
    await requestLink("dana@cobblefield.example").expect(202);
    await new Promise((r) => setTimeout(r, 300));
    expect(await ctx.fakes.listOutbox()).toHaveLength(0);
  });

  it("rejects input that is neither an e-mail address nor a phone number with a field error", async () => {
    const res = await requestLink("not a contact");
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: "invalid_input", fields: { contact: expect.any(String) } });
    const empty = await request(ctx.app).post("/api/auth/link").send({});
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields.contact).toBeDefined();
  });

  it("limits requests per address, whatever the client address", async () => {
    const contact = "limit-test@nowhere.example";
    for (let i = 0; i < signInLimits.perContact; i++) await requestLink(contact).expect(202);
    const limited = await requestLink(contact);
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe("rate_limited");
    expect(limited.headers["retry-after"]).toBeDefined();
  });

  it("limits requests per client address, whatever the contact", async () => {
    const ip = "203.0.113.77";
    for (let i = 0; i < signInLimits.perIp; i++) await requestLink(`ip-test-${i}@nowhere.example`, ip).expect(202);
    expect((await requestLink("ip-test-last@nowhere.example", ip)).status).toBe(429);
  });

  it("gives a new session id at sign-in and ends the session at sign-out", async () => {
    const agent = request.agent(ctx.app);
    const before = await agent.get("/auth/google").expect(302); // creates a pre-sign-in session
    const cookieBefore = before.headers["set-cookie"]?.[0]?.split(";")[0];
    expect(cookieBefore).toMatch(/^sproutline\.sid=/);
    const link = await linkFor(ruth);
    const consumed = await agent.post("/api/auth/link/consume").send({ token: tokenFromLink(link) }).expect(200);
    const cookieAfter = consumed.headers["set-cookie"]?.[0]?.split(";")[0];
    expect(cookieAfter).toMatch(/^sproutline\.sid=/);
    expect(cookieAfter).not.toBe(cookieBefore);
    expect(consumed.headers["set-cookie"]?.[0]).toMatch(/HttpOnly/i);
    expect(consumed.headers["set-cookie"]?.[0]).toMatch(/SameSite=Lax/i);

    // The old session id must not be signed in.
    await request(ctx.app).get("/api/me").set("Cookie", cookieBefore!).expect(401);

    await agent.post("/api/auth/sign-out").expect(204);
    await agent.get("/api/me").expect(401);
    await request(ctx.app).get("/api/me").set("Cookie", cookieAfter!).expect(401);
  });

  it("keeps a customer to their own records: another customer's property is not found", async () => {
    const agent = await signInCustomer(ctx, ruth);
    const own = await agent.get("/api/my/properties").expect(200);
    expect(own.body.properties).toHaveLength(1);
    const ownId = own.body.properties[0].id as number;
    await agent.get(`/api/properties/${ownId}`).expect(200);

    const other = await ctx.db("properties")
      .join("customers", "customers.id", "properties.customer_id")
      .where("customers.external_ref", "C-1002")
      .first<{ id: number }>("properties.id");
    const res = await agent.get(`/api/properties/${other!.id}`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not_found");
  });
});
