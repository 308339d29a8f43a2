import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import nodemailer from "nodemailer";
import type Mail from "nodemailer/lib/mailer";
import { createMessenger } from "../../messaging/create-messenger.ts";
import { photoStorageFromConfig } from "../../storage/index.ts";
import { createTestContext, signInStaff, waitForMessage, type TestContext } from "../../test/harness.ts";
import { createPlanFixture } from "../questions/testing/plan-fixture.ts";
import { replyAddress, replyTokenForPlan } from "../questions/reply-address.ts";
import { jpegWithGps, smallPng, truncatedJpeg } from "../photos/testing/images.ts";
import { startInboundSmtp, type InboundSmtp } from "./listener.ts";
import type { FilingOutcome } from "./service.ts";

const RUTH = "ruth.okonkwo@mail.example";
const TOMASZ = "tomasz.brandt@mail.example";
const LUCIA = "lucia.marchetti@mail.example";

let ctx: TestContext;
let photoDir: string;
let listener: InboundSmtp;
let planId: number;
let address: string;
let domain: string;
const outcomes: FilingOutcome[] = [];
let messageCounter = 0;

const newMessageId = () => `<reply-${Date.now()}-${++messageCounter}@mail.example>`;

/** Sends real SMTP to the listener, as a homeowner's mail provider would. */
async function deliver(mail: Mail.Options) {
  const transport = nodemailer.createTransport({ host: "127.0.0.1", port: listener.port, secure: false, ignoreTLS: true });
  try {
    return await transport.sendMail({ subject: "Re: Your lawn today", messageId: newMessageId(), ...mail });
  } finally {
    transport.close();
  }
}

async function emailMessages() {
  return ctx.db("messages")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .where({ "conversations.plan_id": planId, "messages.source": "email" })
    .orderBy("messages.id")
    .select("messages.id", "messages.kind", "messages.text", "messages.external_id", "messages.author_user_id");
}

async function companyOf(email: string): Promise<number> {
  const row = await ctx.db("customers").join("users", "users.id", "customers.user_id").where("users.email", email).first<{ company_id: number }>("customers.company_id");
  return row.company_id;
}

async function filesUnder(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true }).catch(() => []);
  return entries.filter((e) => e.isFile()).map((e) => e.name);
}

const gmailReply = (body: string) =>
  [
    body,
    "",
    "On Tue, Dec 1, 2026 at 9:14 AM Cobblefield Lawn <",
    `${address}> wrote:`,
    "",
    "> Water 3 times today, 6 minutes per zone.",
  ].join("\n");

beforeAll(async () => {
  photoDir = await mkdtemp(join(tmpdir(), "sproutline-email-photos-"));
  ctx = await createTestContext({ PHOTO_DIR: photoDir });
  domain = ctx.config.INBOUND_EMAIL_DOMAIN;
  ({ planId } = await createPlanFixture(ctx.db, { customerRef: "C-1001" }));
  address = replyAddress(await replyTokenForPlan(ctx.db, planId), domain);
  listener = await startInboundSmtp(
    { db: ctx.db, storage: photoStorageFromConfig(ctx.config), messenger: createMessenger(ctx.config), inboundDomain: domain, log: (_m, err) => ctx.errors.push(err) },
    { host: "127.0.0.1", port: 0, maxBytes: 30 * 1024 * 1024, onFiled: (o) => outcomes.push(o) },
  );
});

afterAll(async () => {
  await listener.close();
  await ctx.close();
  await rm(photoDir, { recursive: true, force: true });
});

beforeEach(async () => {
  outcomes.length = 0;
  await ctx.fakes.clearOutbox();
});

describe("inbound e-mail replies", () => {
  it("files a known homeowner's reply as a question, quoted text stripped, in the technicians' queue", async () => {
    const messageId = newMessageId();
    await deliver({ from: `Ruth Okonkwo <${RUTH}>`, to: address, messageId, text: gmailReply("A few spots by the driveway still look bare. Should I reseed?") });

    const rows = await emailMessages();
    const filed = rows.find((r) => r.external_id === messageId);
    const ruth = await ctx.db("users").where({ email: RUTH }).first<{ id: number }>("id");
    expect(filed).toMatchObject({ kind: "question", text: "A few spots by the driveway still look bare. Should I reseed?", author_user_id: ruth.id });

    const marco = await signInStaff(ctx, "marco@cobblefield.example");
    const queue = await marco.get("/api/questions/open").expect(200);
    const inQueue = queue.body.questions.find((q: { messageId: number }) => q.messageId === Number(filed!.id));
    expect(inQueue).toMatchObject({ planId, customerName: expect.stringContaining("Ruth"), text: filed!.text });
  });

  it("stores attached photos through the photo pipeline", async () => {
    const before = (await filesUnder(photoDir)).length;
    const messageId = newMessageId();
    await deliver({
      from: RUTH,
      to: address,
      messageId,
      text: "Here is the patch by the fence.\n\nSent from my iPhone",
      attachments: [
        { filename: "IMG_2041.JPG", content: await jpegWithGps(3000, 2000), contentType: "image/jpeg" },
        { filename: "patch.png", content: await smallPng(), contentType: "image/png" },
      ],
    });
    const filed = (await emailMessages()).find((r) => r.external_id === messageId)!;
    expect(filed.text).toBe("Here is the patch by the fence.");
    const photos = await ctx.db("photos").where({ message_id: filed.id }).orderBy("position").select("width", "height", "content_type");
    // The 3000×2000 photo was turned upright (EXIF orientation 6) and shrunk to 2048 on its longest side.
    expect(photos).toEqual([
      { width: 1365, height: 2048, content_type: "image/jpeg" },
      { width: 640, height: 480, content_type: "image/jpeg" },
    ]);
    expect((await filesUnder(photoDir)).length).toBe(before + 4);
    expect(outcomes).toEqual([{ kind: "filed", messageId: Number(filed.id), photos: 2, refused: [] }]);
    expect(await ctx.fakes.listOutbox()).toEqual([]);
  });

  it("stores a reply delivered twice (same Message-ID) once", async () => {
    const messageId = newMessageId();
    const mail = { from: RUTH, to: address, messageId, text: "The sprinkler misses the back corner.", attachments: [{ filename: "corner.png", content: await smallPng() }] };
    await deliver(mail);
    const filesAfterFirst = (await filesUnder(photoDir)).length;
    await deliver(mail);

    expect((await emailMessages()).filter((r) => r.external_id === messageId)).toHaveLength(1);
    expect((await filesUnder(photoDir)).length).toBe(filesAfterFirst);
    expect(outcomes.map((o) => o.kind)).toEqual(["filed", "duplicate"]);
  });

  it("keeps a reply to an unknown token as unmatched, not in any conversation", async () => {
    const messageId = newMessageId();
    const before = (await emailMessages()).length;
    await deliver({ from: RUTH, to: `reply+AAAAAAAAAAAAAAAAAAAAAA@${domain}`, messageId, text: "Is it time to feed?" });

    expect((await emailMessages()).length).toBe(before);
    const kept = await ctx.db("unmatched_inbound").where({ channel: "email", external_id: messageId }).select("sender", "body", "company_id", "media_count");
    // The sender is a homeowner of one company, so that company's managers get to see it.
    expect(kept).toEqual([{ sender: RUTH, body: "Is it time to feed?", company_id: await companyOf(RUTH), media_count: 0 }]);
    expect(outcomes).toEqual([{ kind: "unmatched", reason: "unknown_token" }]);
  });

  it("keeps an e-mail from a stranger without a reply address as unmatched, with no company", async () => {
    const messageId = newMessageId();
    await deliver({ from: "someone@stranger.example", to: `hello@${domain}`, messageId, text: "Do you do snow removal?" });
    const kept = await ctx.db("unmatched_inbound").where({ channel: "email", external_id: messageId }).select("sender", "body", "company_id");
    expect(kept).toEqual([{ sender: "someone@stranger.example", body: "Do you do snow removal?", company_id: null }]);
    expect(outcomes).toEqual([{ kind: "unmatched", reason: "no_token" }]);
  });

  it("keeps a reply from someone other than the conversation's homeowner (a forward) as unmatched for that company", async () => {
    const messageId = newMessageId();
    const before = (await emailMessages()).length;
    await deliver({ from: TOMASZ, to: address, messageId, text: gmailReply("My neighbour forwarded this. Can you do my lawn too?"), attachments: [{ filename: "a.png", content: await smallPng() }] });

    expect((await emailMessages()).length).toBe(before);
    const kept = await ctx.db("unmatched_inbound").where({ channel: "email", external_id: messageId }).select("sender", "body", "company_id", "media_count");
    expect(kept).toEqual([{ sender: TOMASZ, body: "My neighbour forwarded this. Can you do my lawn too?", company_id: await companyOf(RUTH), media_count: 1 }]);
    expect(outcomes).toEqual([{ kind: "unmatched", reason: "sender_mismatch" }]);
  });

  it("refuses a non-image and a broken photo, keeps the text and the good photo, and tells the homeowner why", async () => {
    const messageId = newMessageId();
    await deliver({
      from: RUTH,
      to: address,
      messageId,
      text: "Invoice and photos attached.",
      attachments: [
        { filename: "invoice.pdf", content: Buffer.from("%PDF-1.4\n1 0 obj\n<< /Type /Catalog >>\nendobj\n%%EOF\n"), contentType: "application/pdf" },
        { filename: "broken.jpg", content: await truncatedJpeg(), contentType: "image/jpeg" },
        { filename: "lawn.png", content: await smallPng(), contentType: "image/png" },
      ],
    });

    const filed = (await emailMessages()).find((r) => r.external_id === messageId)!;
    expect(filed).toMatchObject({ kind: "question", text: "Invoice and photos attached." });
    expect(await ctx.db("photos").where({ message_id: filed.id }).count<{ count: string }[]>("* as count")).toEqual([{ count: "1" }]);

    const outcome = outcomes[0];
    expect(outcome).toMatchObject({ kind: "filed", photos: 1 });
    expect(outcome?.kind === "filed" && outcome.refused.map((r) => r.filename)).toEqual(["invoice.pdf", "broken.jpg"]);

    // Staff see what was refused in the thread (a staff-only note) ...
    const note = await ctx.db("messages").where({ conversation_id: ctx.db("messages").where({ id: filed.id }).select("conversation_id"), kind: "note" }).orderBy("id", "desc").first<{ text: string }>("text");
    expect(note.text).toContain("invoice.pdf: Only photos (JPEG, PNG, WebP, HEIC) can be attached.");
    expect(note.text).toContain("broken.jpg: This photo could not be read.");

    // ... and the homeowner gets one short automatic e-mail with the reasons.
    const notice = await waitForMessage(ctx.fakes, RUTH);
    expect(notice.subject).toBe("We couldn't add your attachments");
    expect(notice.text).toContain("We could not add 2 of the files you attached:");
    expect(notice.text).toContain("invoice.pdf: Only photos (JPEG, PNG, WebP, HEIC) can be attached.");
    expect(notice.text).toContain("broken.jpg: This photo could not be read.");
    expect((await ctx.fakes.listOutbox()).filter((m) => m.to === RUTH)).toHaveLength(1);
  });

  it("tells a Spanish-speaking homeowner in Spanish", async () => {
    const lucia = await createPlanFixture(ctx.db, { customerRef: "C-1005" });
    await ctx.db("notification_preferences")
      .insert({ customer_id: lucia.customerId, channels: "email", daily_time: "08:00", language: "es" })
      .onConflict("customer_id")
      .merge(["language"]);
    const luciaAddress = replyAddress(await replyTokenForPlan(ctx.db, lucia.planId), domain);
    const text = ["Aquí está la factura.", "", "Enviado desde mi iPhone", "", "El lun, 30 nov 2026 a las 16:02, Cobblefield Lawn", `<${luciaAddress}> escribió:`, "> Su visita está reservada."].join("\n");
    await deliver({ from: LUCIA, to: luciaAddress, text, attachments: [{ filename: "factura.pdf", content: Buffer.from("%PDF-1.4\n%%EOF\n") }] });

    const filed = await ctx.db("messages").join("conversations", "conversations.id", "messages.conversation_id").where({ "conversations.plan_id": lucia.planId, "messages.kind": "question" }).first<{ text: string }>("messages.text");
    expect(filed.text).toBe("Aquí está la factura.");
    const notice = await waitForMessage(ctx.fakes, LUCIA);
    expect(notice.subject).toBe("No pudimos agregar su archivo adjunto");
    expect(notice.text).toContain("factura.pdf: Solo se pueden adjuntar fotos (JPEG, PNG, WebP, HEIC).");
  });

  it("does not answer an autoresponder's refused attachment by e-mail", async () => {
    const messageId = newMessageId();
    await deliver({ from: RUTH, to: address, messageId, text: "I am away until Monday.", headers: { "Auto-Submitted": "auto-replied" }, attachments: [{ filename: "x.txt", content: "not a photo" }] });
    expect(outcomes).toMatchObject([{ kind: "filed", photos: 0 }]);
    // The listener answers the sending server only after any automatic reply was handed to SMTP.
    expect(await ctx.fakes.listOutbox()).toEqual([]);
    expect(ctx.errors).toEqual([]);
  });

  it("reads an HTML-only reply and finds the token in the To header when the relay delivers to another mailbox", async () => {
    const messageId = newMessageId();
    const html = [
      "<div dir=\"ltr\">Can the crew come <b>Thursday</b> instead?</div><br>",
      "<div class=\"gmail_quote\"><div dir=\"ltr\" class=\"gmail_attr\">On Mon, Nov 30, 2026 at 4:02 PM Cobblefield Lawn &lt;",
      `${address}&gt; wrote:<br></div>`,
      "<blockquote class=\"gmail_quote\">Your follow-up visit is booked for Wednesday.</blockquote></div>",
    ].join("");
    await deliver({ from: RUTH, to: address, envelope: { from: RUTH, to: [`inbox@${domain}`] }, messageId, html });

    const filed = (await emailMessages()).find((r) => r.external_id === messageId);
    expect(filed).toMatchObject({ kind: "question", text: "Can the crew come Thursday instead?" });
  });

  it("refuses a message over the size limit with 552 and stores nothing", async () => {
    const small = await startInboundSmtp(
      { db: ctx.db, storage: photoStorageFromConfig(ctx.config), messenger: createMessenger(ctx.config), inboundDomain: domain, log: (_m, err) => ctx.errors.push(err) },
      { host: "127.0.0.1", port: 0, maxBytes: 64 * 1024, onFiled: (o) => outcomes.push(o) },
    );
    try {
      const before = (await emailMessages()).length;
      const transport = nodemailer.createTransport({ host: "127.0.0.1", port: small.port, secure: false, ignoreTLS: true });
      const error = await transport
        .sendMail({ from: RUTH, to: address, subject: "Big", text: "Photo attached.", attachments: [{ filename: "big.png", content: Buffer.alloc(200 * 1024, 7) }] })
        .then(() => null, (err: { responseCode?: number }) => err);
      transport.close();
      expect(error).toMatchObject({ responseCode: 552 });
      expect((await emailMessages()).length).toBe(before);
      expect(outcomes).toEqual([]);
    } finally {
      await small.close();
    }
  });

  it("refuses recipients at another domain at RCPT time and stores nothing", async () => {
    const before = (await emailMessages()).length;
    const unmatchedBefore = await ctx.db("unmatched_inbound").count<{ count: string }[]>("* as count");
    const error = await deliver({ from: RUTH, to: "someone@elsewhere.example", text: "Relay me" }).then(
      () => null,
      (err: { responseCode?: number; code?: string }) => err,
    );
    expect(error).toMatchObject({ code: "EENVELOPE", responseCode: 550 });
    expect((await emailMessages()).length).toBe(before);
    expect(await ctx.db("unmatched_inbound").count<{ count: string }[]>("* as count")).toEqual(unmatchedBefore);
    expect(outcomes).toEqual([]);
  });
});
