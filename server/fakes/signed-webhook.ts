import twilio from "twilio";

export interface WebhookAnswer {
  status: number;
  contentType: string | null;
  body: string;
}

/**
 * POSTs form-encoded params to url the way Twilio calls webhooks: X-Twilio-Signature is the SDK's
 * own HMAC-SHA1 of the exact URL plus the sorted params, keyed with the account's auth token, so the
 * app's real verification code runs against it unchanged.
 */
export async function postSignedWebhook(
  url: string,
  params: Record<string, string>,
  authToken: string,
  signal?: AbortSignal,
): Promise<WebhookAnswer> {
  const signature = twilio.getExpectedTwilioSignature(authToken, url, params);
  const response = await fetch(url, {
    method: "POST",
    headers: {
      "Content-Type": "application/x-www-form-urlencoded; charset=utf-8",
      "X-Twilio-Signature": signature,
      "User-Agent": "TwilioProxy/1.1 (Sproutline local fake)",
      Accept: "*/*",
    },
    body: new URLSearchParams(params).toString(),
    // Twilio gives up on a webhook after 15 s; the caller's signal lets the fake cancel on shutdown.
    signal: signal ? AbortSignal.any([signal, AbortSignal.timeout(15_000)]) : AbortSignal.timeout(15_000),
  });
  return { status: response.status, contentType: response.headers.get("content-type"), body: await response.text() };
}
