import { z } from "zod";

/**
 * Texts and e-mails that reached the company from a sender we couldn't match to a customer's
 * plan (GET /api/unmatched-inbound, managers). Kept so nobody's words are lost; a manager
 * reaches out and marks each one handled.
 */
export const unmatchedInboundSchema = z.object({
  id: z.number().int(),
  channel: z.enum(["sms", "email"]),
  /** E.164 number or e-mail address, as received. */
  sender: z.string(),
  body: z.string(),
  mediaCount: z.number().int(),
  receivedAt: z.string(),
  handledAt: z.string().nullable(),
  handledByName: z.string().nullable(),
  /** The customer with this number or address, when one exists (e.g. a customer with no active plan). */
  customer: z.object({ id: z.number().int(), name: z.string() }).nullable(),
});
export type UnmatchedInbound = z.infer<typeof unmatchedInboundSchema>;

export const unmatchedInboundListSchema = z.object({ items: z.array(unmatchedInboundSchema) });
export type UnmatchedInboundList = z.infer<typeof unmatchedInboundListSchema>;

export const unmatchedInboundResponseSchema = z.object({ item: unmatchedInboundSchema });
export type UnmatchedInboundResponse = z.infer<typeof unmatchedInboundResponseSchema>;
