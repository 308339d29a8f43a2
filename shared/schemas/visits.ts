import { z } from "zod";
import { isoDateSchema, LAWN_CONDITIONS, SHADE_LEVELS, SLOPES, visitSchema } from "../engine/index.ts";
import { DATE_RANGE_MESSAGE, EARLIEST_DATE, LATEST_DATE } from "../engine/schemas/common.ts";

export const WIND_DIRECTIONS = ["calm", "N", "NE", "E", "SE", "S", "SW", "W", "NW", "variable"] as const;

const temperatureFSchema = z
  .number({ error: "Enter the temperature in °F" })
  .min(-40, "Must be at least −40 °F")
  .max(130, "Must be at most 130 °F");
const windMphSchema = z
  .number({ error: "Enter the wind speed in mph" })
  .min(0, "Can't be below 0 mph")
  .max(100, "Must be at most 100 mph");
const windDirectionSchema = z.enum(WIND_DIRECTIONS, { error: "Pick a wind direction from the list" });

/** A required line of text with a message for when it is missing, and an upper bound. */
const requiredText = (missing: string, max: number) =>
  z.string({ error: missing }).trim().min(1, missing).max(max, `Keep it under ${max} characters`);
const optionalText = (max: number) =>
  z.string().trim().max(max, `Keep it under ${max} characters`).optional().transform((s) => (s ? s : undefined));

/** The weather at the time of the visit. */
export const visitConditionsSchema = z.object({
  temperatureF: temperatureFSchema.optional(),
  windMph: windMphSchema.optional(),
  windDirection: windDirectionSchema.optional(),
});
export type VisitConditions = z.infer<typeof visitConditionsSchema>;

/**
 * What a regulator asks to be recorded when a pesticide or other regulated product is applied.
 * The label and the state's rules govern; this is the record, not advice.
 */
export const applicationRecordSchema = z
  .object({
    product: requiredText("Name the product applied", 200),
    epaRegistrationNumber: optionalText(40),
    stateRegistrationNumber: optionalText(40),
    rate: z.object(
      {
        amount: z.number({ error: "Give the rate applied as a number" }).gt(0, "Must be more than 0").max(10_000, "Must be at most 10,000"),
        unit: requiredText("Give the unit of the rate", 40),
      },
      { error: "Give the rate applied" },
    ),
    /** In ft², like the visit's area. */
    areaTreated: z
      .number({ error: "Give the area treated in ft²" })
      .gt(0, "Must be more than 0")
      .max(5_000_000, "Must be at most 5,000,000 ft²"),
    targetPest: requiredText("Name the target pest or weed", 200),
    applicatorName: requiredText("Name the applicator", 120),
    applicatorLicenceNumber: requiredText("Give the applicator's licence number", 60),
    windMph: windMphSchema.optional(),
    windDirection: windDirectionSchema.optional(),
    temperatureF: temperatureFSchema.optional(),
    appliedAt: z.iso
      .datetime({ offset: true, error: "Give the time as an ISO date-time" })
      // The date part in the product's range: year 0000 fails in PostgreSQL.
      .refine((value) => value.slice(0, 10) >= EARLIEST_DATE && value.slice(0, 10) <= LATEST_DATE, { message: DATE_RANGE_MESSAGE })
      .optional(),
  })
  .superRefine((record, ctx) => {
    if (!record.epaRegistrationNumber && !record.stateRegistrationNumber) {
      ctx.addIssue({ code: "custom", path: ["epaRegistrationNumber"], message: "Give the EPA or the state registration number" });
    }
  });
export type ApplicationRecord = z.infer<typeof applicationRecordSchema>;

/**
 * Lawn facts the technician sees on site (slope, shade). Sent only when noted; they are saved on
 * the lawn, so this visit's plan and later ones use them. Absent means "as recorded".
 */
/** The lawn as the crew finds it today; what is given becomes the lawn's record before the plan is made. */
export const lawnOnSiteSchema = z.object({
  lawnCondition: z.enum(LAWN_CONDITIONS, { message: "Pick the lawn's condition from the list" }).optional(),
  slope: z.enum(SLOPES, { error: "Pick the slope from the list" }).optional(),
  shade: z.enum(SHADE_LEVELS, { error: "Pick the shade from the list" }).optional(),
});
export type LawnOnSite = z.infer<typeof lawnOnSiteSchema>;

/** Logging a visit: the engine's visit fields plus which lawn, the conditions, a regulated-application record and notes. */
export const logVisitSchema = z.object({
  propertyId: z.number().int().positive(),
  visit: visitSchema,
  lawn: lawnOnSiteSchema.optional(),
  conditions: visitConditionsSchema.optional(),
  applicationRecord: applicationRecordSchema.optional(),
  notes: z.string().trim().max(4000).optional(),
});
export type LogVisit = z.input<typeof logVisitSchema>;

export const moveVisitSchema = z.object({ date: isoDateSchema });

export const visitLoggedSchema = z.object({
  visitId: z.number().int(),
  planId: z.number().int(),
  /** A welcome message with a sign-in link to the new plan is queued for the homeowner. */
  invitationSent: z.boolean(),
  /** The channels that welcome is queued on (none when the homeowner takes no messages). */
  welcomeChannels: z.array(z.enum(["sms", "email"])),
});
