import { createHash, randomBytes } from "node:crypto";

/** 32 random bytes as URL-safe base64: 43 characters, 256 bits. */
export function newSignInToken(): string {
  return randomBytes(32).toString("base64url");
}

/** Only this hash is stored, so a leaked table cannot be used to sign in. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
