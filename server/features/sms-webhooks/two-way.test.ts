import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import sharp from "sharp";
import twilio from "twilio";
import request from "supertest";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { createTestContext, freePort, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { photoStorageFromConfig } from "../../storage/index.ts";
import { createCustomerWithPlan, daytimeZone, freshPhone, type FixtureCustomer } from "../reminders/testing/fixtures.ts";
import { jpegWithGps, smallPng } from "../photos/testing/images.ts";

let ctx: TestContext;
let server: Server;
let publicUrl: string;
let inboundUrl: string;

beforeAll(async () => {
  const port = await freePort();
  publicUrl = `http://127.0.0.1:${port}`;
  inboundUrl = `${publicUrl}/api/webhooks/sms/inbound`;
  ctx = await createTestContext({ PUBLIC_URL: publicUrl });
  server = createServer(ctx.app);
  await new Promise<void>((r) => server.listen(port, "127.0.0.1", r));
  ctx.fakes.sms.setInboundWebhookUrl(inboundUrl);
});
afterAll(async () => {
  await new Promise((r) => server.close(r));
  await ctx.close();
});
beforeEach(async () => {
  await ctx.fakes.clearOutbox();
});

async function customer(): Promise<FixtureCustomer> {
  const zone = daytimeZone();
  return createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: localDateAt(zone), kind: "mow" }] });
}

const textedQuestions = (planId: number) =>
  ctx
    .db("messages")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .where({ "conversations.plan_id": planId, "messages.source": "sms" })
    .orderBy("messages.id")
    .select<{ id: string; kind: string; text: string; external_id: string; author_user_id: number }[]>("messages.id", "messages.kind", "messages.text", "messages.external_id", "messages.author_user_id");

const photosOf = (messageId: string | number) => ctx.db("photos").where({ message_id: messageId }).orderBy("position").select<{ large_key: string; thumb_key: string; content_type: string }[]>("large_key", "thumb_key", "content_type");

const unmatchedFrom = (sender: string) => ctx.db("unmatched_inbound").where({ sender }).orderBy("id").select<{ channel: string; body: string; media_count: number; company_id: number | null }[]>("channel", "body", "media_count", "company_id");

const jpegMedia = async () => ({ contentType: "image/jpeg", data: await jpegWithGps(1200, 900) });

describe("a free-text SMS from a customer's number", () => {
  it("becomes a question on their plan, stored once when the webhook arrives twice, and is in the technicians' queue", async () => {
    const c = await customer();
    const params = { AccountSid: ctx.config.TWILIO_ACCOUNT_SID, From: c.phone!, To: "+15005550006", Body: "A few spots still look bare, should I reseed?", MessageSid: "SM5f0e7a1b2c3d4e5f60718293a4b5c6d7", NumMedia: "0" };
    const signature = twilio.getExpectedTwilioSignature(ctx.config.TWILIO_AUTH_TOKEN, inboundUrl, params);
    const first = await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", signature).send(params).expect(200);
    expect(first.text).toContain("Thanks, we got your message. A technician will answer you here.");
    const again = await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", signature).send(params).expect(200);
    // The repeat is not stored, and not answered a second time.
    expect(again.text).not.toContain("<Message>");

    const stored = await textedQuestions(c.planId);
    expect(stored).toEqual([{ id: expect.any(String), kind: "question", text: params.Body, external_id: params.MessageSid, author_user_id: c.userId }]);

    const queue = await (await signInStaff(ctx, "marco@cobblefield.example")).get("/api/questions/open").expect(200);
    const inQueue = (queue.body.questions as { messageId: number; planId: number; text: string }[]).filter((q) => q.planId === c.planId);
    expect(inQueue.map((q) => [q.messageId, q.text])).toEqual([[Number(stored[0]!.id), params.Body]]);
  });

  it("goes on the customer's newest active plan", async () => {
    const c = await customer();
    const plan = await ctx.db("care_plans").where({ id: c.planId }).first();
    const later = (minutes: number) => ctx.db.raw("now() + make_interval(mins => ?)", [minutes]);
    const visit = async () =>
      (await ctx.db("service_visits").insert({ property_id: plan.property_id, visit_date: "2026-12-01", services: ["overseeding"], details: JSON.stringify({ areaFt2: 1000 }) }).returning<{ id: number }[]>("id"))[0]!.id;
    const [newer] = await ctx.db("care_plans").insert({ property_id: plan.property_id, visit_id: await visit(), program_version: 1, input: "{}", created_at: later(1) }).returning<{ id: number }[]>("id");
    const [cancelled] = await ctx.db("care_plans").insert({ property_id: plan.property_id, visit_id: await visit(), program_version: 1, input: "{}", status: "cancelled", created_at: later(2) }).returning<{ id: number }[]>("id");
    await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "Which plan is this on?" });
    expect(await textedQuestions(c.planId)).toEqual([]);
    expect(await textedQuestions(cancelled!.id)).toEqual([]);
    expect((await textedQuestions(newer!.id)).map((m) => m.text)).toEqual(["Which plan is this on?"]);
  });
});

describe("MMS photos", () => {
  it("are fetched with the provider's credentials and stored as JPEG without metadata", async () => {
    const c = await customer();
    const result = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "Is this fungus?", media: [await jpegMedia()] });
    expect(result.replies).toEqual(["Cobblefield Turf: Thanks, we got your message and photo. A technician will answer you here."]);
    // The media URL answers only with the account's credentials, as Twilio's does.
    expect((await fetch(result.mediaUrls[0]!)).status).toBe(401);

    const [message] = await textedQuestions(c.planId);
    expect(message!.text).toBe("Is this fungus?");
    const photos = await photosOf(message!.id);
    expect(photos).toHaveLength(1);
    expect(photos[0]!.content_type).toBe("image/jpeg");
    const stored = await photoStorageFromConfig(ctx.config).get(photos[0]!.large_key);
    const meta = await sharp(stored!).metadata();
    expect(meta.format).toBe("jpeg");
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    // Orientation was applied (the camera was turned), not carried along as a flag.
    expect([meta.width, meta.height, meta.orientation]).toEqual([900, 1200, undefined]);
  });

  it("a photo that can't be fetched: the text is kept, the photo refused, and the reply says why", async () => {
    const c = await customer();
    const result = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "Look at this patch", media: [{ contentType: "image/jpeg", data: null }] });
    expect(result.replies).toEqual([
      "Cobblefield Turf: We got your message, but not your photo: we couldn't download it. Please try again with a regular camera photo (JPEG or PNG).",
    ]);
    const [message] = await textedQuestions(c.planId);
    expect(message!.text).toBe("Look at this patch");
    expect(await photosOf(message!.id)).toEqual([]);
  });

  it("media that is not an image is refused from its bytes, whatever type it claims; good photos beside it are kept", async () => {
    const c = await customer();
    const notAPhoto = { contentType: "image/jpeg", data: Buffer.from("%PDF-1.7\n1 0 obj << /Type /Catalog >> endobj\n") };
    const result = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "Invoice and the lawn", media: [notAPhoto, { contentType: "image/png", data: await smallPng() }] });
    expect(result.replies).toEqual([
      "Cobblefield Turf: We got your message, but not your photo: it isn't a photo we can open. Please try again with a regular camera photo (JPEG or PNG).",
    ]);
    const [message] = await textedQuestions(c.planId);
    const photos = await photosOf(message!.id);
    expect(photos.map((p) => p.content_type)).toEqual(["image/jpeg"]);
  });

  it("a photo with no words and nothing usable stores nothing, and says why", async () => {
    const c = await customer();
    const result = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "", media: [{ contentType: "video/mp4", data: Buffer.alloc(4096, 7) }] });
    expect(result.replies).toEqual(["Cobblefield Turf: We couldn't take your photo: it isn't a photo we can open. Please try again with a regular camera photo (JPEG or PNG)."]);
    expect(await textedQuestions(c.planId)).toEqual([]);
  });

  it("a media URL outside the provider's API is never fetched", async () => {
    const c = await customer();
    let called = false;
    const elsewhere = createServer((_req, res) => {
      called = true;
      res.end("x");
    });
    await new Promise<void>((r) => elsewhere.listen(0, "127.0.0.1", r));
    const params = {
      From: c.phone!, To: "+15005550006", Body: "see photo", MessageSid: "SM00000000000000000000000000ffee01", NumMedia: "1",
      MediaUrl0: `http://127.0.0.1:${(elsewhere.address() as AddressInfo).port}/internal`, MediaContentType0: "image/jpeg",
    };
    const res = await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", twilio.getExpectedTwilioSignature(ctx.config.TWILIO_AUTH_TOKEN, inboundUrl, params)).send(params).expect(200);
    await new Promise((r) => elsewhere.close(r));
    expect(called).toBe(false);
    expect(res.text).toContain("but not your photo: we couldn't download it.");
    expect((await textedQuestions(c.planId)).map((m) => m.text)).toEqual(["see photo"]);
  });
});

describe("texts we can't file on a plan", () => {
  it("from an unknown number: kept as unmatched, one polite reply a day however many texts", async () => {
    const stranger = freshPhone();
    await ctx.db("companies").where({ slug: "cobblefield" }).update({ phone: "+13305550142" });
    const first = await ctx.fakes.sms.simulateInbound({ from: stranger, body: "Hi, is this the lawn guy?" });
    expect(first.replies).toEqual([
      "Cobblefield Turf: Hello! This number isn't on file with Cobblefield Turf Care, so we couldn't pass your text on. Please call or text us at (330) 555-0142.",
    ]);
    const second = await ctx.fakes.sms.simulateInbound({ from: stranger, body: "Hello??", media: [await jpegMedia()] });
    expect(second.replies).toEqual([]);
    const company = await ctx.db("companies").where({ slug: "cobblefield" }).first("id");
    expect(await unmatchedFrom(stranger)).toEqual([
      { channel: "sms", body: "Hi, is this the lawn guy?", media_count: 0, company_id: company.id },
      { channel: "sms", body: "Hello??", media_count: 1, company_id: company.id },
    ]);
    await ctx.db("companies").where({ slug: "cobblefield" }).update({ phone: null });
  });

  it("from an unknown number, delivered twice: kept once", async () => {
    const stranger = freshPhone();
    const params = { From: stranger, To: "+15005550006", Body: "Is this Cobblefield?", MessageSid: "SM00000000000000000000000000ffee03", NumMedia: "0" };
    const signature = twilio.getExpectedTwilioSignature(ctx.config.TWILIO_AUTH_TOKEN, inboundUrl, params);
    const first = await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", signature).send(params).expect(200);
    expect(first.text).toContain("This number isn't on file");
    const again = await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", signature).send(params).expect(200);
    expect(again.text).not.toContain("<Message>");
    expect((await unmatchedFrom(stranger)).map((u) => u.body)).toEqual(["Is this Cobblefield?"]);
  });

  it("from an unknown number, two texts arriving at once: both kept, one reply", async () => {
    const stranger = freshPhone();
    const post = (sid: string, body: string) => {
      const params = { From: stranger, To: "+15005550006", Body: body, MessageSid: sid, NumMedia: "0" };
      return request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", twilio.getExpectedTwilioSignature(ctx.config.TWILIO_AUTH_TOKEN, inboundUrl, params)).send(params).expect(200);
    };
    const answers = await Promise.all([post("SM00000000000000000000000000ffee04", "one"), post("SM00000000000000000000000000ffee05", "two")]);
    expect(answers.filter((a) => a.text.includes("<Message>"))).toHaveLength(1);
    expect((await unmatchedFrom(stranger)).map((u) => u.body).sort()).toEqual(["one", "two"]);
  });

  it("from a customer with no active plan: kept as unmatched and told to call", async () => {
    const c = await customer();
    await ctx.db("care_plans").where({ id: c.planId }).update({ status: "cancelled" });
    const result = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "Can you come back in spring?" });
    expect(result.replies).toEqual([
      "Cobblefield Turf: Thanks for your text. You have no active lawn plan with us right now, so it can't go to a technician. Please contact our office directly.",
    ]);
    expect((await unmatchedFrom(c.phone!)).map((u) => u.body)).toEqual(["Can you come back in spring?"]);
  });
});

describe("keywords keep priority", () => {
  it("STOP with a photo opts out and files nothing; HELP from a stranger is answered and not kept", async () => {
    const c = await customer();
    const stop = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "STOP", media: [await jpegMedia()] });
    expect(stop.replies[0]).toMatch(/^Cobblefield Turf: You're unsubscribed/);
    expect(await textedQuestions(c.planId)).toEqual([]);
    expect(await ctx.db("channel_opt_outs").where({ customer_id: c.customerId }).pluck("channel")).toEqual(["sms"]);

    const stranger = freshPhone();
    const help = await ctx.fakes.sms.simulateInbound({ from: stranger, body: "help" });
    expect(help.replies[0]).toMatch(/^Cobblefield Turf: lawn care plan reminders/);
    expect(await unmatchedFrom(stranger)).toEqual([]);
  });
});

describe("signatures", () => {
  it("an unsigned text with media is refused before anything is fetched or stored", async () => {
    const c = await customer();
    const params = { From: c.phone!, To: "+15005550006", Body: "unsigned", MessageSid: "SM00000000000000000000000000ffee02", NumMedia: "1", MediaUrl0: `${ctx.fakes.smsUrl}/2010-04-01/Accounts/x/Messages/y/Media/z`, MediaContentType0: "image/jpeg" };
    await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").send(params).expect(403);
    await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", twilio.getExpectedTwilioSignature("wrong-token", inboundUrl, params)).send(params).expect(403);
    expect(await textedQuestions(c.planId)).toEqual([]);
    expect(await unmatchedFrom(c.phone!)).toEqual([]);
  });
});
