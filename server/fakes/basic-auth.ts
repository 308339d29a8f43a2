/** Reads "Authorization: Basic …" into user and password; null when absent or malformed. */
export function parseBasicAuth(header: string | undefined, options: { formEncoded?: boolean } = {}): { user: string; password: string } | null {
  if (!header?.startsWith("Basic ")) return null;
  const decoded = Buffer.from(header.slice("Basic ".length), "base64").toString("utf8");
  const colon = decoded.indexOf(":");
  if (colon < 0) return null;
  const user = decoded.slice(0, colon);
  const password = decoded.slice(colon + 1);
  if (!options.formEncoded) return { user, password };
  // OAuth 2.0 (RFC 6749 §2.3.1) form-encodes client id and secret before Basic encoding; Twilio does not.
  try {
    return { user: decodeURIComponent(user.replaceAll("+", " ")), password: decodeURIComponent(password.replaceAll("+", " ")) };
  } catch {
    return null;
  }
}
