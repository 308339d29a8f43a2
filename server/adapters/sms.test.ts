import express from "express";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { listenHttp } from "../fakes/http-listen.ts";
import { startSmsGateway, type FakeSmsGateway } from "../fakes/sms-gateway.ts";
import { startWebhookReceiver } from "../fakes/testing/webhook-receiver.ts";
import { createSmsSender, SmsSendError, toSmsSendError, verifyTwilioSignature } from "./sms.ts";

const accountSid = "AC5f0a11ce5f0a11ce5f0a11ce5f0a11ce";
const authToken = "test-auth-token";
const from = "+15005550006";

let gateway: FakeSmsGateway;
let receiver: Awaited<ReturnType<typeof startWebhookReceiver>>;

beforeAll(async () => {
  gateway = await startSmsGateway({ accountSid, authToken, statusStepMs: 20 });
  receiver = await startWebhookReceiver();
});
afterAll(async () => {
  await gateway.stop();
  await receiver.stop();
});
afterEach(() => {
  gateway.clear();
  gateway.setFaults({ failureRate: 0, latencyMs: 0, rateLimitPerSecond: 0, down: false });
  receiver.received.length = 0;
});

const sender = (overrides: Partial<Parameters<typeof createSmsSender>[0]> = {}) =>
  createSmsSender({ accountSid, authToken, from, apiBaseUrl: gateway.url, ...overrides });

async function sendError(promise: Promise<unknown>): Promise<SmsSendError> {
  const error = await promise.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(SmsSendError);
  return error as SmsSendError;
}

describe("createSmsSender through the real twilio SDK", () => {
  it("reaches the fake gateway, which records the message", async () => {
    const result = await sender().send({ to: "+13305550123", body: "Water 3 times today, 6 minutes per zone." });
    expect(result.sid).toMatch(/^SM[0-9a-f]{32}$/);
    expect(result.status).toBe("queued");
    const [recorded] = gateway.messages();
    expect(recorded).toMatchObject({ sid: result.sid, to: "+13305550123", from, body: "Water 3 times today, 6 minutes per zone.", direction: "outbound-api" });

    const listed = (await (await fetch(`${gateway.url}/__messages`)).json()) as { messages: Array<{ sid: string }> };
    expect(listed.messages.map((m) => m.sid)).toEqual([result.sid]);
  });

  it("sends through a Messaging Service when from is an MG sid", async () => {
    await sender({ from: "MG0123456789abcdef0123456789abcdef" }).send({ to: "+13305550123", body: "Hello" });
    expect(gateway.messages()[0]).toMatchObject({ messagingServiceSid: "MG0123456789abcdef0123456789abcdef", from });
  });

  it("turns a per-sender rate limit (429, code 20429) into a transient error", async () => {
    gateway.setFaults({ rateLimitPerSecond: 1 });
    await sender().send({ to: "+13305550123", body: "first" });
    const error = await sendError(sender().send({ to: "+13305550124", body: "second" }));
    expect(error).toMatchObject({ kind: "transient", status: 429, code: 20429 });
    expect(gateway.messages()).toHaveLength(1);
  });

  it("turns an invalid number (code 21211) into a permanent error", async () => {
    const error = await sendError(sender().send({ to: "+13305550000", body: "hi" }));
    expect(error).toMatchObject({ kind: "permanent", status: 400, code: 21211 });
    expect(error.message).toContain("+13305550000");
  });

  it("treats the provider's 500/503 answers and outages as transient", async () => {
    gateway.setFaults({ failureRate: 1 });
    const failed = await sendError(sender().send({ to: "+13305550123", body: "hi" }));
    expect(failed.kind).toBe("transient");
    expect([500, 503]).toContain(failed.status);

    gateway.setFaults({ failureRate: 0, down: true });
    expect(await sendError(sender().send({ to: "+13305550123", body: "hi" }))).toMatchObject({ kind: "transient", status: 503, code: 20503 });
  });

  it("treats a time-out and a refused connection as transient", async () => {
    gateway.setFaults({ latencyMs: 300 });
    const slow = await sendError(sender({ timeoutMs: 100 }).send({ to: "+13305550123", body: "hi" }));
    expect(slow).toMatchObject({ kind: "transient", status: null });
    // As with the real API, a request the client gave up on may still be accepted: retries can duplicate.
    await expect.poll(() => gateway.messages().length, { timeout: 2_000 }).toBe(1);

    const closed = await listenHttp(express(), 0, "127.0.0.1");
    await closed.close();
    const refused = await sendError(sender({ apiBaseUrl: closed.url }).send({ to: "+13305550123", body: "hi" }));
    expect(refused).toMatchObject({ kind: "transient", status: null, code: "ECONNREFUSED" });
  });

  it("treats wrong credentials (401, code 20003) as permanent", async () => {
    const error = await sendError(sender({ authToken: "not-the-token" }).send({ to: "+13305550123", body: "hi" }));
    expect(error).toMatchObject({ kind: "permanent", status: 401, code: 20003 });
  });

  it("refuses a customer who texted STOP with the permanent error 21610", async () => {
    gateway.setInboundWebhookUrl(`${receiver.url}/sms/inbound`);
    await gateway.simulateInbound({ from: "+13305550123", body: "stop" });
    const error = await sendError(sender().send({ to: "+13305550123", body: "Reminder" }));
    expect(error).toMatchObject({ kind: "permanent", code: 21610 });
    await gateway.simulateInbound({ from: "+13305550123", body: "START" });
    await expect(sender().send({ to: "+13305550123", body: "Reminder" })).resolves.toMatchObject({ status: "queued" });
  });

  it("gets signed status callbacks queued → sent → delivered that verifyTwilioSignature accepts", async () => {
    const statusCallback = `${receiver.url}/sms/status?reminder=42`;
    const { sid } = await sender().send({ to: "+13305550123", body: "Mow at 3 inches today.", statusCallback });
    const calls = await receiver.waitFor(3);
    expect(calls.map((c) => c.params.MessageStatus)).toEqual(["queued", "sent", "delivered"]);
    for (const call of calls) {
      expect(call.url).toBe(statusCallback);
      expect(call.params).toMatchObject({ MessageSid: sid, SmsSid: sid, AccountSid: accountSid, To: "+13305550123", From: from });
      expect(verifyTwilioSignature(authToken, call.url, call.params, call.signature)).toBe(true);
      expect(verifyTwilioSignature("some-other-token", call.url, call.params, call.signature)).toBe(false);
      expect(verifyTwilioSignature(authToken, call.url, { ...call.params, MessageStatus: "failed" }, call.signature)).toBe(false);
    }
    expect(verifyTwilioSignature(authToken, statusCallback, calls[0]!.params, undefined)).toBe(false);
    expect(gateway.messages()[0]?.status).toBe("delivered");
  });

  it("reports numbers ending in 1111 as undelivered with error 30003", async () => {
    await sender().send({ to: "+13305551111", body: "hi", statusCallback: `${receiver.url}/status` });
    const calls = await receiver.waitFor(3);
    expect(calls[2]?.params).toMatchObject({ MessageStatus: "undelivered", ErrorCode: "30003" });
    expect(gateway.messages()[0]).toMatchObject({ status: "undelivered", errorCode: 30003 });
  });
});

describe("toSmsSendError", () => {
  it("classifies by status, then by transport failure, else permanent", () => {
    expect(toSmsSendError({ status: 429, code: 20429, message: "Too Many Requests" }).kind).toBe("transient");
    expect(toSmsSendError({ status: 503, code: 20503, message: "x" }).kind).toBe("transient");
    expect(toSmsSendError({ status: 400, code: 21610, message: "x" })).toMatchObject({ kind: "permanent", code: 21610 });
    expect(toSmsSendError(Object.assign(new Error("socket hang up"), { code: "ECONNRESET" })).kind).toBe("transient");
    expect(toSmsSendError(new Error("Required parameter \"params['to']\" missing."))).toMatchObject({ kind: "permanent", status: null });
  });
});
