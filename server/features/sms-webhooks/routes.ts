import { z } from "zod";
import type { AppDeps } from "../../app.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { photoStorageFromConfig, type PhotoStorage } from "../../storage/index.ts";
import { handleInboundText } from "./inbound.ts";
import { mediaOfWebhook } from "./media.ts";
import { twimlReply } from "./replies.ts";
import { requireTwilioSignature } from "./signature.ts";
import { applyStatusCallback } from "./status.ts";

const inboundSchema = z.looseObject({ From: z.string().min(1), Body: z.string().default(""), MessageSid: z.string().min(1).optional(), NumMedia: z.string().optional() });
const statusSchema = z.looseObject({ MessageSid: z.string().min(1), MessageStatus: z.string().min(1), ErrorCode: z.string().optional() });
const statusQuerySchema = z.looseObject({ reminder: z.coerce.number().int().positive().optional() });

/**
 * Twilio's webhooks. Public (Twilio has no session), but every request must carry a valid
 * X-Twilio-Signature for PUBLIC_URL + path, checked before anything else.
 */
export function smsWebhookRoutes(deps: AppDeps, storage: PhotoStorage = photoStorageFromConfig(deps.config)): RouteSpec[] {
  const signed = requireTwilioSignature(deps.config);
  const inbound = { db: deps.db, config: deps.config, storage };
  return [
    route({
      method: "post",
      path: "/api/webhooks/sms/inbound",
      access: "public",
      before: [signed],
      body: inboundSchema,
      handler: async ({ body, res }) => {
        const texts = await handleInboundText(inbound, { from: body.From.trim(), body: body.Body, messageSid: body.MessageSid ?? null, media: mediaOfWebhook(body) });
        res.type("text/xml").send(twimlReply(...texts));
      },
    }),
    route({
      method: "post",
      path: "/api/webhooks/sms/status",
      access: "public",
      before: [signed],
      query: statusQuerySchema,
      body: statusSchema,
      handler: async ({ body, query }) => {
        await applyStatusCallback(deps.db, { sid: body.MessageSid, status: body.MessageStatus, errorCode: body.ErrorCode, reminderId: query.reminder });
      },
    }),
  ];
}
