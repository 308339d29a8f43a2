import { z } from "zod";
import { isoDateSchema } from "../engine/index.ts";

/**
 * Follow-up visits and callbacks. A callback is a follow-up visit the company does for
 * free because the result failed; only callbacks carry a cost and an outcome.
 */
export const FOLLOW_UP_STATUSES = ["requested", "scheduled", "done", "closed"] as const;
export type FollowUpStatus = (typeof FOLLOW_UP_STATUSES)[number];

/** Our own taxonomy of why a lawn needed a return visit. */
export const FOLLOW_UP_REASONS = [
  "no_germination",
  "washed_out",
  "mowed_too_early",
  "herbicide_applied",
  "poor_seed_soil_contact",
  "under_watering",
  "over_watering",
  "disease",
  "pest_damage",
  "other",
] as const;
export type FollowUpReason = (typeof FOLLOW_UP_REASONS)[number];

export const followUpReasonLabels: Record<FollowUpReason, string> = {
  no_germination: "No germination",
  washed_out: "Washed out by rain",
  mowed_too_early: "Mowed too early",
  herbicide_applied: "Weed killer applied",
  poor_seed_soil_contact: "Poor seed-soil contact",
  under_watering: "Not watered enough",
  over_watering: "Watered too much",
  disease: "Disease",
  pest_damage: "Pest damage",
  other: "Other",
};

/** How the homeowner answered a booked visit. */
export const CUSTOMER_RESPONSES = ["confirmed", "another_day"] as const;
export type CustomerResponse = (typeof CUSTOMER_RESPONSES)[number];

export const FOLLOW_UP_OUTCOMES = ["resolved", "partly_resolved", "not_resolved", "pending"] as const;
export type FollowUpOutcome = (typeof FOLLOW_UP_OUTCOMES)[number];

/**
 * Where each status may go next. A follow-up that turns out not to be needed is closed
 * without a visit, so requested and scheduled may also close directly.
 */
export const followUpTransitions: Record<FollowUpStatus, readonly FollowUpStatus[]> = {
  requested: ["scheduled", "closed"],
  scheduled: ["done", "closed"],
  done: ["closed"],
  closed: [],
};

const positiveId = z.number().int().positive().max(2_147_483_647);
const note = z.string().trim().max(2000, "Keep it under 2,000 characters");
const hours = z.number().min(0, "Must be 0 or more").max(200, "Must be at most 200 hours");
const money = z.number().min(0, "Must be 0 or more").max(100_000, "Must be at most 100,000");
/** A local wall-clock time, "HH:MM" (24-hour), at the lawn. */
export const arrivalTimeSchema = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, "Give a time like 09:30");
const prep = z.string().trim().max(500, "Keep it under 500 characters");

/**
 * What a homeowner is usually asked to do before a return visit, by its reason; staff pick
 * one or write their own. Common practice, not a rule: the technician knows the lawn.
 */
export const customerPrepSuggestions: Record<FollowUpReason, readonly string[]> = {
  no_germination: ["Don't mow for two days before the visit", "Keep watering as planned until we arrive"],
  washed_out: ["Don't rake or fill the washed-out spots; we'll want to see them as they are"],
  mowed_too_early: ["Don't mow again before the visit"],
  herbicide_applied: ["Keep the product's container or label so we can read it", "Don't apply anything else before the visit"],
  poor_seed_soil_contact: ["Don't mow the day before", "Water lightly the evening before so the soil is soft"],
  under_watering: ["Keep watering as planned and leave the sprinkler settings as they are"],
  over_watering: ["Skip watering the day before the visit"],
  disease: ["Don't mow or water the day before", "Don't apply any treatment before we've looked"],
  pest_damage: ["Don't apply pest control before the visit", "Leave the damaged patches as they are"],
  other: ["Make sure the gate is unlocked and pets are inside"],
};

export const createFollowUpSchema = z.object({
  propertyId: positiveId,
  planId: positiveId.optional(),
  questionMessageId: z.number().int().positive().optional(),
  reason: z.enum(FOLLOW_UP_REASONS, "Pick a reason from the list"),
  reasonNote: note.optional(),
  scheduledFor: isoDateSchema.optional(),
  technicianId: positiveId.optional(),
  isCallback: z.boolean().optional(),
  arrivalStart: arrivalTimeSchema.optional(),
  arrivalEnd: arrivalTimeSchema.optional(),
  customerPrep: prep.optional(),
});
export type CreateFollowUp = z.infer<typeof createFollowUpSchema>;

export const updateFollowUpSchema = z
  .object({
    status: z.enum(FOLLOW_UP_STATUSES).optional(),
    scheduledFor: isoDateSchema.nullable().optional(),
    technicianId: positiveId.nullable().optional(),
    reason: z.enum(FOLLOW_UP_REASONS, "Pick a reason from the list").optional(),
    reasonNote: note.nullable().optional(),
    isCallback: z.boolean().optional(),
    labourHours: hours.nullable().optional(),
    materialsCost: money.nullable().optional(),
    outcome: z.enum(FOLLOW_UP_OUTCOMES).optional(),
    outcomeNote: note.nullable().optional(),
    arrivalStart: arrivalTimeSchema.nullable().optional(),
    arrivalEnd: arrivalTimeSchema.nullable().optional(),
    customerPrep: prep.nullable().optional(),
    workDone: note.nullable().optional(),
  })
  .refine((patch) => Object.values(patch).some((v) => v !== undefined), { message: "Nothing to change", path: ["_"] });
export type UpdateFollowUp = z.infer<typeof updateFollowUpSchema>;

export const FOLLOW_UP_SORTS = ["date", "status", "reason", "technician", "customer", "createdAt", "labourHours", "materialsCost"] as const;

/** Table filters; the same filters drive the CSV export. `from`/`to` bound the follow-up's date. */
export const followUpFilterSchema = z.object({
  status: z.enum(FOLLOW_UP_STATUSES).optional(),
  reason: z.enum(FOLLOW_UP_REASONS).optional(),
  technicianId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
  callback: z.stringbool().optional(),
  from: isoDateSchema.optional(),
  to: isoDateSchema.optional(),
  sort: z.enum(FOLLOW_UP_SORTS).default("date"),
  order: z.enum(["asc", "desc"]).default("desc"),
});
export const followUpListQuerySchema = followUpFilterSchema.extend({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});
export type FollowUpFilter = z.infer<typeof followUpFilterSchema>;
export type FollowUpListQuery = z.infer<typeof followUpListQuerySchema>;

export const followUpSchema = z.object({
  id: z.number().int(),
  propertyId: z.number().int(),
  street: z.string(),
  customerId: z.number().int(),
  customerName: z.string(),
  planId: z.number().int().nullable(),
  questionMessageId: z.number().int().nullable(),
  status: z.enum(FOLLOW_UP_STATUSES),
  /** The day it is scheduled for, or the day it was requested while it has no date. */
  date: z.string(),
  scheduledFor: z.string().nullable(),
  technicianId: z.number().int().nullable(),
  technicianName: z.string().nullable(),
  reason: z.enum(FOLLOW_UP_REASONS),
  reasonNote: z.string().nullable(),
  isCallback: z.boolean(),
  labourHours: z.number().nullable(),
  materialsCost: z.number().nullable(),
  outcome: z.enum(FOLLOW_UP_OUTCOMES),
  outcomeNote: z.string().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  arrivalStart: z.string().nullable(),
  arrivalEnd: z.string().nullable(),
  customerPrep: z.string().nullable(),
  workDone: z.string().nullable(),
  customerResponse: z.enum(CUSTOMER_RESPONSES).nullable(),
  customerRespondedAt: z.string().nullable(),
});
export type FollowUp = z.infer<typeof followUpSchema>;

export const followUpListSchema = z.object({ rows: z.array(followUpSchema), total: z.number().int() });
export const followUpResponseSchema = z.object({ followUp: followUpSchema });

/** A follow-up visit as its homeowner sees it: no costs, outcomes or staff notes. */
export const planVisitSchema = z.object({
  id: z.number().int(),
  planId: z.number().int().nullable(),
  status: z.enum(FOLLOW_UP_STATUSES),
  scheduledFor: z.string().nullable(),
  arrivalStart: z.string().nullable(),
  arrivalEnd: z.string().nullable(),
  /** First name only: who rings the bell. */
  technicianName: z.string().nullable(),
  reason: z.enum(FOLLOW_UP_REASONS),
  customerPrep: z.string().nullable(),
  workDone: z.string().nullable(),
  customerResponse: z.enum(CUSTOMER_RESPONSES).nullable(),
});
export type PlanVisit = z.infer<typeof planVisitSchema>;
export const planVisitsResponseSchema = z.object({ visits: z.array(planVisitSchema) });
export const planVisitResponseSchema = z.object({ visit: planVisitSchema });

export const WEEKDAYS = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"] as const;
export type Weekday = (typeof WEEKDAYS)[number];

/** The homeowner asks to move a booked visit; both parts optional. */
export const anotherDaySchema = z.object({
  note: z.string().trim().max(1000, "Keep it under 1,000 characters").optional(),
  preferredDays: z.array(z.enum(WEEKDAYS)).max(7).optional(),
});
export type AnotherDay = z.infer<typeof anotherDaySchema>;
