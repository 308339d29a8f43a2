import { z } from "zod";
import type { AppDeps } from "../../app.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { handleInboundText } from "./inbound.ts";
import { twimlReply } from "./replies.ts";
import { requireTwilioSignature } from "./signature.ts";
import { applyStatusCallback } from "./status.ts";

const inboundSchema = z.looseObject({ From: z.string().min(1), Body: z.string().default("") });
const statusSchema = z.looseObject({ MessageSid: z.string().min(1), MessageStatus: z.string().min(1), ErrorCode: z.string().optional() });
const statusQuerySchema = z.looseObject({ reminder: z.coerce.number().int().positive().optional() });

/**
 * Twilio's webhooks. Public (Twilio has no session), but every request must carry a valid
 * X-Twilio-Signature for PUBLIC_URL + path, checked before anything else.
 */
export function smsWebhookRoutes(deps: AppDeps): RouteSpec[] {
  const signed = requireTwilioSignature(deps.config);
  return [
    route({
      method: "post",
      path: "/api/webhooks/sms/inbound",
      access: "public",
      before: [signed],
      body: inboundSchema,
      handler: async ({ body, res }) => {
        const texts = await handleInboundText(deps.db, body.From.trim(), body.Body);
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
