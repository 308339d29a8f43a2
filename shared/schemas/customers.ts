import { z } from "zod";
import { planHeaderSchema } from "./plans.ts";
import { propertySummarySchema } from "./properties.ts";
import { followUpSchema } from "./follow-ups.ts";
import { applicationRecordSchema, visitConditionsSchema } from "./visits.ts";

/** Search by name, street, phone (any format: its digits are compared), e-mail or customer number. */
export const customerSearchQuerySchema = z.object({
  q: z.string().trim().max(100, "Keep the search under 100 characters").default(""),
  limit: z.coerce.number().int().min(1).max(100).default(25),
});

export const customerSummarySchema = z.object({
  id: z.number().int(),
  firstName: z.string(),
  lastName: z.string(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  externalRef: z.string().nullable(),
  properties: z.array(z.object({ id: z.number().int(), label: z.string(), street: z.string(), town: z.string() })),
  activePlans: z.number().int(),
});
export type CustomerSummary = z.infer<typeof customerSummarySchema>;
export const customerSearchResponseSchema = z.object({ customers: z.array(customerSummarySchema) });

export const customerVisitSchema = z.object({
  id: z.number().int(),
  propertyId: z.number().int(),
  visitDate: z.string(),
  services: z.array(z.string()),
  technicianName: z.string().nullable(),
  notes: z.string().nullable(),
  planId: z.number().int().nullable(),
  conditions: visitConditionsSchema.nullable(),
  applicationRecord: applicationRecordSchema.nullable(),
});
export type CustomerVisit = z.infer<typeof customerVisitSchema>;

/** The conversation thread of one care plan, in numbers. */
export const customerConversationSchema = z.object({
  planId: z.number().int(),
  messageCount: z.number().int(),
  openQuestions: z.number().int(),
  /** ISO date-time; null for a thread with no message yet. */
  lastMessageAt: z.string().nullable(),
});
export type CustomerConversation = z.infer<typeof customerConversationSchema>;

export const REMINDER_STATES = ["scheduled", "sending", "sent", "delivered", "failed", "cancelled", "skipped_opted_out"] as const;

/** One reminder from the ledger with how its delivery went. */
export const customerReminderSchema = z.object({
  id: z.number().int(),
  planId: z.number().int(),
  /** Plan reminders, and notices (answers, visit changes, the welcome) that ride on the same ledger. */
  kind: z.enum(["daily_summary", "watering_nudge", "conversation_update", "visit_update", "welcome"]),
  channel: z.enum(["sms", "email"]),
  localDate: z.string(),
  localTime: z.string(),
  dueAt: z.string(),
  state: z.enum(REMINDER_STATES),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  sentAt: z.string().nullable(),
});
export type CustomerReminder = z.infer<typeof customerReminderSchema>;

/** How many reminders the customer page lists: the most recent by due time. */
export const CUSTOMER_REMINDERS_LIMIT = 50;

/** The customer page. */
export const customerDetailSchema = z.object({
  customer: customerSummarySchema.omit({ properties: true, activePlans: true }).extend({ createdAt: z.string() }),
  properties: z.array(propertySummarySchema),
  plans: z.array(planHeaderSchema),
  visits: z.array(customerVisitSchema),
  followUps: z.array(followUpSchema),
  conversations: z.array(customerConversationSchema),
  reminders: z.array(customerReminderSchema),
});
export type CustomerDetail = z.infer<typeof customerDetailSchema>;
