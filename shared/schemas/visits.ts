import { z } from "zod";
import { isoDateSchema, visitSchema } from "../engine/index.ts";

/** Logging a visit: the engine's visit fields plus which lawn and optional notes. */
export const logVisitSchema = z.object({
  propertyId: z.number().int().positive(),
  visit: visitSchema,
  notes: z.string().trim().max(4000).optional(),
});
export type LogVisit = z.input<typeof logVisitSchema>;

export const moveVisitSchema = z.object({ date: isoDateSchema });

export const visitLoggedSchema = z.object({
  visitId: z.number().int(),
  planId: z.number().int(),
  /** After a seeding visit the homeowner is sent a link to the new plan. */
  invitationSent: z.boolean(),
});
