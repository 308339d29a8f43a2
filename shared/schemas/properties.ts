import { z } from "zod";
import { placeRulesSchema } from "../engine/index.ts";
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
/** One lawn read on its own: also the facts the care-plan engine reads (grass, sprinklers, mowing, frost), checked by the engine's parser where used. */
export const propertyDetailSchema = propertySummarySchema.extend({
  lawn: z.record(z.string(), z.unknown()),
  /** Staff only: the company's rules for the place the lawn is in (null: none), so the visit form warns as the plan will. */
  placeRules: placeRulesSchema.nullable().optional(),
});
export type PropertyDetail = z.infer<typeof propertyDetailSchema>;
export const propertyResponseSchema = z.object({ property: propertyDetailSchema });
