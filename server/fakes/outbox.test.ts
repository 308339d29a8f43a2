import { describe, expect, it } from "vitest";
import { buildOutbox, extractLinks } from "./outbox.ts";
import type { RecordedSms } from "./sms-log.ts";
import type { ReceivedEmail } from "./smtp.ts";

const sms = (overrides: Partial<RecordedSms>): RecordedSms => ({
  sid: "SM1",
  accountSid: "AC1",
  direction: "outbound-api",
  to: "+13305550123",
  from: "+15005550006",
  messagingServiceSid: null,
  body: "",
  status: "delivered",
  errorCode: null,
  statusCallback: null,
  dateCreated: "2026-12-01T10:00:00.000Z",
  dateUpdated: "2026-12-01T10:00:00.000Z",
  callbacks: [],
  ...overrides,
});

const email = (overrides: Partial<ReceivedEmail>): ReceivedEmail => ({
  id: "email-1",
  envelopeFrom: "plans@sproutline.example",
  envelopeTo: ["jo@example.com"],
  from: "Sproutline <plans@sproutline.example>",
  to: "Jo <jo@example.com>",
  subject: "Your plan",
  text: "",
  html: null,
  messageId: null,
  headers: {},
  listUnsubscribe: null,
  receivedAt: "2026-12-01T10:00:00.000Z",
  ...overrides,
});

describe("extractLinks", () => {
  it("finds http(s) links in text and HTML, once each, without trailing punctuation", () => {
    expect(
      extractLinks(
        "Open https://app.example/sign-in?token=a_b-c. Or see (https://app.example/plan), or http://x.example/Lawn_(grass)!",
        '<a href="https://app.example/sign-in?token=a_b-c">Open</a> <a href="https://app.example/q?a=1&amp;b=2">Q</a> ftp://no.example',
      ),
    ).toEqual(["https://app.example/sign-in?token=a_b-c", "https://app.example/plan", "http://x.example/Lawn_(grass)", "https://app.example/q?a=1&b=2"]);
    expect(extractLinks("no links here")).toEqual([]);
  });
});

describe("buildOutbox", () => {
  it("merges outgoing SMS and e-mail newest first, leaving out texts customers sent", () => {
    const outbox = buildOutbox(
      [
        sms({ sid: "SM-old", body: "Sign in: https://app.example/s/1", dateCreated: "2026-12-01T09:00:00.000Z" }),
        sms({ sid: "SM-in", direction: "inbound", body: "STOP", dateCreated: "2026-12-01T12:00:00.000Z" }),
        sms({ sid: "SM-reply", direction: "outbound-reply", body: "Bye", dateCreated: "2026-12-01T11:00:00.000Z" }),
      ],
      [email({ id: "email-1", text: "Plan: https://app.example/p", html: '<a href="https://app.example/p">Plan</a>', receivedAt: "2026-12-01T10:00:00.000Z" })],
    );
    expect(outbox.map((m) => m.id)).toEqual(["SM-reply", "email-1", "SM-old"]);
    expect(outbox[1]).toMatchObject({ channel: "email", to: "jo@example.com", subject: "Your plan", status: "received", links: ["https://app.example/p"] });
    expect(outbox[2]).toMatchObject({ channel: "sms", subject: null, html: null, status: "delivered", links: ["https://app.example/s/1"] });
  });
});
