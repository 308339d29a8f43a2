import { z } from "zod";

/** A message the local fakes received (development and tests only). */
export const outboxMessageSchema = z.object({
  id: z.string(),
  channel: z.enum(["sms", "email"]),
  to: z.string(),
  from: z.string(),
  subject: z.string().nullable(),
  text: z.string(),
  html: z.string().nullable(),
  status: z.string(),
  receivedAt: z.string(),
  links: z.array(z.string()),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
export const outboxResponseSchema = z.object({ messages: z.array(outboxMessageSchema) });
export type OutboxResponse = z.infer<typeof outboxResponseSchema>;
