import { createCipheriv, createDecipheriv, createHash, hkdfSync, randomBytes } from "node:crypto";

/**
 * Calendar feed links carry a 256-bit random token. The database holds its SHA-256 (to look
 * up feed requests) and a sealed copy (AES-256-GCM, key derived from SESSION_SECRET) so the
 * homeowner can see the same link again: calendar apps keep polling the link they were
 * given, so showing a new one each time would break their subscription. A copy of the
 * database alone reveals no working link.
 */
export const newFeedToken = (): string => randomBytes(32).toString("base64url");

export const hashFeedToken = (token: string): string => createHash("sha256").update(token).digest("hex");

/** 32 random bytes in base64url: anything else is not a token we issued. */
export const isFeedTokenShaped = (value: string): boolean => /^[A-Za-z0-9_-]{43}$/.test(value);

function sealingKey(secret: string): Buffer {
  return Buffer.from(hkdfSync("sha256", secret, "sproutline", "calendar-feed-token v1", 32));
}

export function sealFeedToken(secret: string, token: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", sealingKey(secret), iv);
  const sealed = Buffer.concat([cipher.update(token, "utf8"), cipher.final()]);
  return ["v1", iv.toString("base64url"), cipher.getAuthTag().toString("base64url"), sealed.toString("base64url")].join(".");
}

/** The token, or undefined when it was sealed under another secret (SESSION_SECRET changed). */
export function openFeedToken(secret: string, sealed: string): string | undefined {
  const [version, iv, tag, data] = sealed.split(".");
  if (version !== "v1" || !iv || !tag || !data) return undefined;
  try {
    const decipher = createDecipheriv("aes-256-gcm", sealingKey(secret), Buffer.from(iv, "base64url"));
    decipher.setAuthTag(Buffer.from(tag, "base64url"));
    return Buffer.concat([decipher.update(Buffer.from(data, "base64url")), decipher.final()]).toString("utf8");
  } catch {
    return undefined;
  }
}
