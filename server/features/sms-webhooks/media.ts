import { photoLimits } from "#shared/schemas/questions";
import type { Config } from "../../config.ts";

/** One attachment of an inbound MMS as Twilio announces it (MediaUrlN, MediaContentTypeN). */
export type InboundMedia = { url: string; contentType: string };

export type FetchedMedia = { ok: true; data: Buffer } | { ok: false; reason: "unreachable" | "too_large" | "not_allowed" };

/** Twilio answers media quickly; a customer's text should not wait on a stuck download. */
const FETCH_TIMEOUT_MS = 10_000;
/**
 * All of one text's downloads together: Twilio gives up on the webhook after 15 s, and the reply
 * (and the stored text) must come before that.
 */
export const ALL_MEDIA_TIMEOUT_MS = 12_000;

/**
 * Only the provider's own API origin is fetched (Twilio's, or the configured base URL of the local
 * fake): the URL arrives in a webhook, and a signed webhook is still no reason to let it point our
 * server at any address it likes, credentials attached.
 */
export function providerOrigin(config: Pick<Config, "TWILIO_API_BASE_URL">): string {
  return new URL(config.TWILIO_API_BASE_URL ?? "https://api.twilio.com").origin;
}

/** Reads a body up to `limit` bytes; past that the download is cancelled rather than buffered. */
async function readBounded(body: ReadableStream<Uint8Array>, limit: number): Promise<Buffer | null> {
  const chunks: Uint8Array[] = [];
  let total = 0;
  const reader = body.getReader();
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel();
      return null;
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/**
 * Downloads one attachment with HTTP Basic (account SID and auth token), as Twilio requires when
 * media authentication is on. Twilio redirects to its file store; fetch drops the Authorization
 * header on a redirect to another origin, so the credentials never leave the provider.
 */
export async function fetchMedia(
  config: Pick<Config, "TWILIO_API_BASE_URL" | "TWILIO_ACCOUNT_SID" | "TWILIO_AUTH_TOKEN">,
  media: InboundMedia,
  deadline?: AbortSignal,
): Promise<FetchedMedia> {
  let url: URL;
  try {
    url = new URL(media.url);
  } catch {
    return { ok: false, reason: "not_allowed" };
  }
  if (url.origin !== providerOrigin(config)) return { ok: false, reason: "not_allowed" };
  const credentials = Buffer.from(`${config.TWILIO_ACCOUNT_SID}:${config.TWILIO_AUTH_TOKEN}`).toString("base64");
  try {
    const response = await fetch(url, { headers: { Authorization: `Basic ${credentials}` }, redirect: "follow", signal: deadline ? AbortSignal.any([deadline, AbortSignal.timeout(FETCH_TIMEOUT_MS)]) : AbortSignal.timeout(FETCH_TIMEOUT_MS) });
    if (!response.ok || !response.body) {
      await response.body?.cancel();
      return { ok: false, reason: "unreachable" };
    }
    const declared = Number(response.headers.get("content-length") ?? "0");
    if (declared > photoLimits.maxBytes) {
      await response.body.cancel();
      return { ok: false, reason: "too_large" };
    }
    const data = await readBounded(response.body, photoLimits.maxBytes);
    return data ? { ok: true, data } : { ok: false, reason: "too_large" };
  } catch {
    return { ok: false, reason: "unreachable" };
  }
}

/** MediaUrl0..n / MediaContentType0..n of the webhook form, at most NumMedia (Twilio sends up to 10). */
export function mediaOfWebhook(form: Record<string, unknown>): InboundMedia[] {
  const count = Math.min(Number.parseInt(String(form.NumMedia ?? "0"), 10) || 0, 10);
  const media: InboundMedia[] = [];
  for (let i = 0; i < count; i += 1) {
    const url = form[`MediaUrl${i}`];
    if (typeof url === "string" && url) media.push({ url, contentType: String(form[`MediaContentType${i}`] ?? "") });
  }
  return media;
}
