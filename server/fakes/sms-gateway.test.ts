import twilio from "twilio";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { startSmsGateway, type FakeSmsGateway } from "./sms-gateway.ts";
import { startWebhookReceiver } from "./testing/webhook-receiver.ts";

const accountSid = "AC00000000000000000000000000000001";
const authToken = "gateway-test-token";
const basic = "Basic " + Buffer.from(`${accountSid}:${authToken}`).toString("base64");

let gateway: FakeSmsGateway;
let app: Awaited<ReturnType<typeof startWebhookReceiver>>;

beforeAll(async () => {
  // The stand-in app answers inbound texts with TwiML, as ours will.
  app = await startWebhookReceiver((hook) =>
    hook.path === "/sms/inbound"
      ? { status: 200, type: "text/xml", body: '<?xml version="1.0" encoding="UTF-8"?><Response><Message>Thanks &amp; noted: we will call you.</Message></Response>' }
      : { status: 204 },
  );
  gateway = await startSmsGateway({ accountSid, authToken, statusStepMs: 10, inboundWebhookUrl: `${app.url}/sms/inbound` });
});
afterAll(async () => {
  await gateway.stop();
  await app.stop();
});
afterEach(() => {
  gateway.clear();
  app.received.length = 0;
});

function postMessage(form: Record<string, string>, authorization = basic) {
  return fetch(`${gateway.url}/2010-04-01/Accounts/${accountSid}/Messages.json`, {
    method: "POST",
    headers: { Authorization: authorization, "Content-Type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams(form),
  });
}

describe("fake SMS gateway, REST shape", () => {
  it("answers 201 with Twilio's message resource", async () => {
    const res = await postMessage({ To: "+13305550123", From: "+15005550006", Body: "Hello" });
    expect(res.status).toBe(201);
    const body = (await res.json()) as Record<string, unknown>;
    expect(body).toMatchObject({
      account_sid: accountSid,
      api_version: "2010-04-01",
      to: "+13305550123",
      from: "+15005550006",
      body: "Hello",
      status: "queued",
      direction: "outbound-api",
      num_segments: "1",
    });
    expect(body.sid).toMatch(/^SM[0-9a-f]{32}$/);
    expect(String(body.date_created)).toMatch(/^[A-Z][a-z]{2}, \d{2} [A-Z][a-z]{2} \d{4} \d{2}:\d{2}:\d{2} \+0000$/);

    const fetched = await fetch(`${gateway.url}/2010-04-01/Accounts/${accountSid}/Messages/${String(body.sid)}.json`, { headers: { Authorization: basic } });
    expect(((await fetched.json()) as { sid: string }).sid).toBe(body.sid);
  });

  it("answers errors in Twilio's error shape", async () => {
    const res = await postMessage({ To: "+13305550000", From: "+15005550006", Body: "Hello" });
    expect(res.status).toBe(400);
    expect(await res.json()).toEqual({
      code: 21211,
      message: "The 'To' number +13305550000 is not a valid phone number.",
      more_info: "https://www.twilio.com/docs/errors/21211",
      status: 400,
    });
    expect((await postMessage({ To: "+13305550123", From: "+15005550006" })).status).toBe(400);
    const unauthenticated = await postMessage({ To: "+13305550123", From: "+15005550006", Body: "x" }, "Basic " + Buffer.from(`${accountSid}:nope`).toString("base64"));
    expect(unauthenticated.status).toBe(401);
    expect(await unauthenticated.json()).toMatchObject({ code: 20003, status: 401 });
    expect(gateway.messages()).toHaveLength(0);
  });

  it("is re-configured at runtime through POST /__control and rejects bad settings", async () => {
    const ok = await fetch(`${gateway.url}/__control`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify({ rateLimitPerSecond: 2, latencyMs: 0 }),
    });
    expect(await ok.json()).toMatchObject({ rateLimitPerSecond: 2, failureRate: 0, down: false });
    const statuses = [];
    for (let i = 0; i < 3; i++) statuses.push((await postMessage({ To: "+13305550123", From: "+15005550006", Body: `n${i}` })).status);
    expect(statuses).toEqual([201, 201, 429]);
    // A different sender has its own allowance.
    expect((await postMessage({ To: "+13305550123", From: "+15005550007", Body: "other" })).status).toBe(201);

    const bad = await fetch(`${gateway.url}/__control`, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ failureRate: 2 }) });
    expect(bad.status).toBe(400);
    gateway.setFaults({ rateLimitPerSecond: 0 });
  });

  it("lists and clears messages through /__messages", async () => {
    await postMessage({ To: "+13305550123", From: "+15005550006", Body: "one" });
    await postMessage({ To: "+13305550124", From: "+15005550006", Body: "two" });
    const filtered = (await (await fetch(`${gateway.url}/__messages?to=${encodeURIComponent("+13305550124")}`)).json()) as { messages: Array<{ body: string }> };
    expect(filtered.messages.map((m) => m.body)).toEqual(["two"]);
    expect((await fetch(`${gateway.url}/__messages`, { method: "DELETE" })).status).toBe(204);
    expect(gateway.messages()).toHaveLength(0);
  });
});

describe("fake SMS gateway, inbound texts", () => {
  it("POSTs a signed webhook and returns the app's TwiML, recording <Message> replies", async () => {
    const res = await fetch(`${gateway.url}/__inbound`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify({ from: "+13305550123", body: "Is this brown patch normal?" }),
    });
    expect(res.status).toBe(200);
    const result = (await res.json()) as { messageSid: string; webhookStatus: number; twiml: string; replies: string[] };
    expect(result.webhookStatus).toBe(200);
    expect(result.twiml).toContain("<Message>");
    expect(result.replies).toEqual(["Thanks & noted: we will call you."]);

    const [hook] = app.received;
    expect(hook?.params).toMatchObject({ From: "+13305550123", To: "+15005550006", Body: "Is this brown patch normal?", MessageSid: result.messageSid, AccountSid: accountSid });
    expect(twilio.validateRequest(authToken, hook!.signature!, hook!.url, hook!.params)).toBe(true);
    expect(twilio.validateRequest("wrong-token", hook!.signature!, hook!.url, hook!.params)).toBe(false);

    expect(gateway.messages().map((m) => [m.direction, m.from, m.to, m.body])).toEqual([
      ["inbound", "+13305550123", "+15005550006", "Is this brown patch normal?"],
      ["outbound-reply", "+15005550006", "+13305550123", "Thanks & noted: we will call you."],
    ]);
  });

  it("offers a hand-operated form at GET /__inbound and answers its post with a page", async () => {
    const page = await fetch(`${gateway.url}/__inbound`);
    const html = await page.text();
    expect(page.headers.get("content-type")).toContain("text/html");
    expect(html).toContain('<html lang="en">');
    expect(html).toMatch(/<label for="from">/);
    expect(html).toMatch(/<label for="body">/);

    const posted = await fetch(`${gateway.url}/__inbound`, {
      method: "POST",
      headers: { "Content-Type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ from: "+13305550123", to: "+15005550006", body: "Yes" }),
    });
    expect(posted.status).toBe(200);
    expect(await posted.text()).toContain("The app answered with HTTP 200");
  });

  it("sends media the way Twilio does: MediaUrlN behind HTTP Basic, signed with the rest", async () => {
    const photo = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 4]);
    const res = await fetch(`${gateway.url}/__inbound`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify({ from: "+13305550123", body: "", media: [{ contentType: "image/jpeg", base64: photo.toString("base64") }, { contentType: "image/png", missing: true }] }),
    });
    expect(res.status).toBe(200);
    const result = (await res.json()) as { messageSid: string; mediaUrls: string[] };
    const [hook] = app.received;
    expect(hook?.params).toMatchObject({ NumMedia: "2", Body: "", MediaContentType0: "image/jpeg", MediaContentType1: "image/png", MediaUrl0: result.mediaUrls[0], MediaUrl1: result.mediaUrls[1] });
    expect(result.mediaUrls[0]).toMatch(new RegExp(`^${gateway.url}/2010-04-01/Accounts/${accountSid}/Messages/${result.messageSid}/Media/ME[0-9a-f]{32}$`));
    expect(twilio.validateRequest(authToken, hook!.signature!, hook!.url, hook!.params)).toBe(true);

    expect((await fetch(result.mediaUrls[0]!)).status).toBe(401);
    const fetched = await fetch(result.mediaUrls[0]!, { headers: { Authorization: basic } });
    expect(fetched.status).toBe(200);
    expect(fetched.headers.get("content-type")).toBe("image/jpeg");
    expect(Buffer.from(await fetched.arrayBuffer())).toEqual(photo);
    expect((await fetch(result.mediaUrls[1]!, { headers: { Authorization: basic } })).status).toBe(404);
  });

  it("refuses a text with neither words nor media", async () => {
    const res = await fetch(`${gateway.url}/__inbound`, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ from: "+13305550123", body: "" }) });
    expect(res.status).toBe(400);
    expect(app.received).toEqual([]);
  });

  it("the hand-operated form can attach the sample photo", async () => {
    const form = new FormData();
    form.append("from", "+13305550123");
    form.append("to", "+15005550006");
    form.append("body", "Look");
    form.append("samplePhoto", "on");
    const posted = await fetch(`${gateway.url}/__inbound`, { method: "POST", body: form });
    expect(posted.status).toBe(200);
    expect(await posted.text()).toContain("Photos attached: 1.");
    expect(app.received[0]?.params).toMatchObject({ NumMedia: "1", MediaContentType0: "image/jpeg", Body: "Look" });
  });

  it("says clearly when no inbound webhook URL is configured", async () => {
    gateway.setInboundWebhookUrl(null);
    const res = await fetch(`${gateway.url}/__inbound`, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ from: "+13305550123", body: "hi" }) });
    expect(res.status).toBe(409);
    expect(((await res.json()) as { error: string }).error).toContain("FAKE_SMS_INBOUND_WEBHOOK_URL");
    gateway.setInboundWebhookUrl(`${app.url}/sms/inbound`);
  });
});
