import { z } from "zod";
import { recordId } from "./ids.ts";

export const idParamSchema = z.object({ id: recordId });

export const propertySummarySchema = z.object({
  id: z.number().int(),
  customerId: z.number().int(),
  label: z.string(),
  street: z.string(),
  town: z.string(),
  region: z.string(),
  postalCode: z.string(),
  timeZone: z.string(),
  lawnAreaFt2: z.number().nullable(),
});
export type PropertySummary = z.infer<typeof propertySummarySchema>;
export const propertyListSchema = z.object({ properties: z.array(propertySummarySchema) });
export const propertyResponseSchema = z.object({ property: propertySummarySchema });
