import { z } from "zod";
import { planHeaderSchema } from "./plans.ts";
import { propertySummarySchema } from "./properties.ts";
import { followUpSchema } from "./follow-ups.ts";

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
});

/** The customer page. Conversations and reminders are added by their own features. */
export const customerDetailSchema = z.object({
  customer: customerSummarySchema.omit({ properties: true, activePlans: true }).extend({ createdAt: z.string() }),
  properties: z.array(propertySummarySchema),
  plans: z.array(planHeaderSchema),
  visits: z.array(customerVisitSchema),
  followUps: z.array(followUpSchema),
});
export type CustomerDetail = z.infer<typeof customerDetailSchema>;
