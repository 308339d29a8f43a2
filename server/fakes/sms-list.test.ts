import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { startSmsGateway, type FakeSmsGateway } from "./sms-gateway.ts";

const accountSid = "AC00000000000000000000000000000002";
const authToken = "list-test-token";
const basic = "Basic " + Buffer.from(`${accountSid}:${authToken}`).toString("base64");

let gateway: FakeSmsGateway;
beforeAll(async () => {
  gateway = await startSmsGateway({ accountSid, authToken, statusStepMs: 5 });
});
afterAll(async () => gateway.stop());
afterEach(() => gateway.clear());

const base = () => `${gateway.url}/2010-04-01/Accounts/${accountSid}/Messages.json`;
const send = (To: string, Body: string) =>
  fetch(base(), { method: "POST", headers: { Authorization: basic, "Content-Type": "application/x-www-form-urlencoded" }, body: new URLSearchParams({ To, From: "+15005550006", Body }) });
const list = async (query: Record<string, string>, authorization = basic) => {
  const res = await fetch(`${base()}?${new URLSearchParams(query)}`, { headers: { Authorization: authorization } });
  return { status: res.status, body: (await res.json()) as { messages: { sid: string; to: string; body: string }[]; page_size: number } };
};

describe("fake SMS gateway: listing messages (Twilio's GET …/Messages.json)", () => {
  it("filters by To and DateSent> (on or after), newest first, as the real API documents", async () => {
    await send("+13315550101", "first");
    await send("+13315550102", "other number");
    await send("+13315550101", "second");
    const today = new Date().toISOString().slice(0, 10);
    const { status, body } = await list({ To: "+13315550101", "DateSent>": today });
    expect(status).toBe(200);
    expect(body.messages.map((m) => m.body)).toEqual(["second", "first"]);
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    expect((await list({ To: "+13315550101", "DateSent>": tomorrow })).body.messages).toEqual([]);
    expect((await list({ To: "+13315550101", "DateSent>": new Date(Date.now() + 60_000).toISOString() })).body.messages).toEqual([]);
    expect((await list({ PageSize: "1" })).body.messages).toHaveLength(1);
  });

  it("needs the account's credentials like every other REST call", async () => {
    expect((await list({}, "Basic " + Buffer.from(`${accountSid}:wrong`).toString("base64"))).status).toBe(401);
  });
});
