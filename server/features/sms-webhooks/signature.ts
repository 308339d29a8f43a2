import type { NextFunction, Request, Response } from "express";
import type { Config } from "../../config.ts";
import { verifyTwilioSignature } from "../../adapters/sms.ts";
import { HttpError } from "../../http/errors.ts";

/**
 * Twilio signs the exact URL it called plus the form fields. We rebuild that URL from PUBLIC_URL
 * (what we told Twilio) and the path with its query, never from the Host header, which a caller
 * controls. Anything unsigned or mis-signed is refused with 403 before the body is looked at.
 */
export function requireTwilioSignature(config: Pick<Config, "PUBLIC_URL" | "TWILIO_AUTH_TOKEN">) {
  const base = config.PUBLIC_URL.replace(/\/$/, "");
  return (req: Request, _res: Response, next: NextFunction) => {
    const params = (req.body ?? {}) as Record<string, unknown>;
    const url = base + req.originalUrl;
    if (!req.is("application/x-www-form-urlencoded") || !verifyTwilioSignature(config.TWILIO_AUTH_TOKEN, url, params, req.header("X-Twilio-Signature"))) {
      next(new HttpError(403, "bad_signature", "This request is not signed by our SMS provider."));
      return;
    }
    next();
  };
}
