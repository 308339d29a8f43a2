import { createHmac, timingSafeEqual } from "node:crypto";
import type { Config } from "../../config.ts";

/*
 * One-click e-mail unsubscribe (RFC 8058). The link carries the customer id and an HMAC of it keyed
 * with the server secret, so it works without signing in, cannot be forged for another customer,
 * and needs no table. Rotating SESSION_SECRET retires every old link (the page then asks the
 * customer to sign in and change preferences instead).
 */
const purpose = "email-unsubscribe:";

export function unsubscribeToken(secret: string, customerId: number): string {
  return createHmac("sha256", secret).update(purpose + customerId).digest("base64url");
}

export function verifyUnsubscribeToken(secret: string, customerId: number, token: string): boolean {
  const expected = Buffer.from(unsubscribeToken(secret, customerId));
  const given = Buffer.from(token);
  return given.length === expected.length && timingSafeEqual(given, expected);
}

export const UNSUBSCRIBE_PATH = "/api/unsubscribe/email";

export function unsubscribeUrl(config: Pick<Config, "PUBLIC_URL" | "SESSION_SECRET">, customerId: number): string {
  const url = new URL(UNSUBSCRIBE_PATH, config.PUBLIC_URL);
  url.searchParams.set("c", String(customerId));
  url.searchParams.set("t", unsubscribeToken(config.SESSION_SECRET, customerId));
  return url.href;
}

/** List-Unsubscribe with the https URL first and a mailto (RFC 2369), plus RFC 8058's one-click marker. */
export function unsubscribeHeaders(config: Pick<Config, "PUBLIC_URL" | "SESSION_SECRET" | "EMAIL_FROM">, customerId: number): Record<string, string> {
  const address = /<([^>]+)>/.exec(config.EMAIL_FROM)?.[1] ?? config.EMAIL_FROM;
  const domain = address.split("@")[1] ?? "sproutline.example";
  const mailto = `mailto:unsubscribe@${domain}?subject=${encodeURIComponent(`unsubscribe ${customerId} ${unsubscribeToken(config.SESSION_SECRET, customerId)}`)}`;
  return {
    "List-Unsubscribe": `<${unsubscribeUrl(config, customerId)}>, <${mailto}>`,
    "List-Unsubscribe-Post": "List-Unsubscribe=One-Click",
  };
}

export const planUrl = (config: Pick<Config, "PUBLIC_URL">, planId: number) => new URL(`/portal/plan/${planId}`, config.PUBLIC_URL).href;
