import { z } from "zod";

/*
 * The rules of one place a company works in, as the company entered them: the engine applies
 * them, it does not know the law. Month-day windows recur every year; weekdays are 0 = Sunday.
 */

const MONTH_DAY = /^(\d{2})-(\d{2})$/;
/** Days in each month of a leap year: "02-29" is a valid end for a window that runs to the end of February. */
const MAX_DAY = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31] as const;

export function isValidMonthDay(value: unknown): value is string {
  if (typeof value !== "string") return false;
  const match = MONTH_DAY.exec(value);
  if (!match) return false;
  const month = Number(match[1]);
  const day = Number(match[2]);
  return month >= 1 && month <= 12 && day >= 1 && day <= (MAX_DAY[month - 1] ?? 0);
}

export const monthDaySchema = z.string().refine(isValidMonthDay, { message: "Use MM-DD, for example 11-15" });

/** From and to are both included; a window whose end comes before its start runs over New Year. */
export const blackoutWindowSchema = z.object({ from: monthDaySchema, to: monthDaySchema });

export const PHOSPHORUS_RULES = ["allowed", "needs_reason"] as const;
export type PhosphorusRule = (typeof PHOSPHORUS_RULES)[number];

export const WEEKDAYS = [0, 1, 2, 3, 4, 5, 6] as const;

export const wateringDaysSchema = z.object({
  allowedWeekdays: z
    .array(z.number().int().min(0).max(6))
    .min(1, "Allow at least one day")
    .max(7)
    .refine((days) => new Set(days).size === days.length, { message: "List each day once" }),
  /** Days from the visit during which a new lawn may be watered any day (0: no exemption). */
  newLawnExemptDays: z.number().int().min(0, "Must be 0 or more").max(120, "Must be at most 120 days").default(0),
});

export const placeRulesSchema = z.object({
  name: z.string().trim().min(1, "Name the place").max(80),
  fertilizerBlackouts: z.array(blackoutWindowSchema).max(6, "At most 6 windows").default([]),
  phosphorus: z.enum(PHOSPHORUS_RULES).default("allowed"),
  /** Absent: the place limits no watering days. */
  watering: wateringDaysSchema.optional(),
});

export type BlackoutWindow = z.output<typeof blackoutWindowSchema>;
export type WateringDays = z.output<typeof wateringDaysSchema>;
export type PlaceRules = z.output<typeof placeRulesSchema>;
export type PlaceRulesInput = z.input<typeof placeRulesSchema>;
