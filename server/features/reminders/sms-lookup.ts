import type { Config } from "../../config.ts";

/*
 * "Did a text with exactly this body reach this number since then?" Twilio has no idempotency key
 * for sending messages, so after an attempt whose outcome we did not hear (time-out, or a worker
 * killed between the provider accepting and us recording it) this is how a resend is avoided: list
 * recent messages to the number (Twilio's documented To and DateSent> filters) and match the frozen
 * body. The caller also ignores sids another reminder already owns.
 */
export type SmsLookup = (query: { to: string; body: string; since: Date }) => Promise<string[]>;

type ListedMessage = { sid: string; to: string; body: string; direction: string; date_created: string; status: string };

/** Clocks of our database and the provider's differ a little; look a bit further back. */
const CLOCK_SLACK_MS = 5 * 60_000;

export function createSmsLookup(config: Pick<Config, "TWILIO_ACCOUNT_SID" | "TWILIO_AUTH_TOKEN" | "TWILIO_API_BASE_URL">, timeoutMs = 10_000): SmsLookup {
  const base = (config.TWILIO_API_BASE_URL ?? "https://api.twilio.com").replace(/\/$/, "");
  const auth = "Basic " + Buffer.from(`${config.TWILIO_ACCOUNT_SID}:${config.TWILIO_AUTH_TOKEN}`).toString("base64");
  return async ({ to, body, since }) => {
    const from = new Date(since.getTime() - CLOCK_SLACK_MS);
    const url = new URL(`${base}/2010-04-01/Accounts/${config.TWILIO_ACCOUNT_SID}/Messages.json`);
    url.searchParams.set("To", to);
    // Day granularity on the provider's side (a queued message may not have a sent date yet); exact time here.
    url.searchParams.set("DateSent>", from.toISOString().slice(0, 10));
    url.searchParams.set("PageSize", "1000");
    const response = await fetch(url, { headers: { Authorization: auth, Accept: "application/json" }, signal: AbortSignal.timeout(timeoutMs) });
    if (!response.ok) throw new Error(`message look-up answered ${response.status}`);
    const { messages } = (await response.json()) as { messages: ListedMessage[] };
    return messages
      .filter((m) => m.direction === "outbound-api" && m.body === body && Date.parse(m.date_created) >= from.getTime() && m.status !== "failed")
      .map((m) => m.sid);
  };
}
