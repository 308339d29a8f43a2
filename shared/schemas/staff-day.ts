import { z } from "zod";
import { FOLLOW_UP_REASONS, FOLLOW_UP_STATUSES } from "./follow-ups.ts";
import { questionSummarySchema } from "./question-queue.ts";

/**
 * GET /api/staff/day: a technician's working day on the staff home. Technicians see their own
 * visits and questions; managers see the whole company, or one technician with `technicianId`.
 * "Today" is the company's calendar date.
 */
export const staffDayQuerySchema = z.object({
  technicianId: z.coerce.number().int().positive().max(2_147_483_647).optional(),
});
export type StaffDayQuery = z.infer<typeof staffDayQuerySchema>;

export const staffDayVisitSchema = z.object({
  id: z.number().int(),
  /** The day it is booked for (the lawn's calendar). */
  date: z.string(),
  status: z.enum(FOLLOW_UP_STATUSES),
  /** Arrival window told to the homeowner, "HH:MM"; null while none is set. */
  arrivalStart: z.string().nullable(),
  arrivalEnd: z.string().nullable(),
  reason: z.enum(FOLLOW_UP_REASONS),
  reasonNote: z.string().nullable(),
  customerId: z.number().int(),
  customerName: z.string(),
  /** E.164, for tap to call or text; null when the homeowner gave none. */
  phone: z.string().nullable(),
  street: z.string(),
  town: z.string(),
  planId: z.number().int().nullable(),
  technicianId: z.number().int().nullable(),
  technicianName: z.string().nullable(),
  /** Its day has passed and it is neither done nor closed. */
  overdue: z.boolean(),
});
export type StaffDayVisit = z.infer<typeof staffDayVisitSchema>;

export const staffDayQuestionSchema = questionSummarySchema.extend({
  /** Waiting longer than the company's answer target. */
  overdue: z.boolean(),
  assignedToName: z.string().nullable(),
});
export type StaffDayQuestion = z.infer<typeof staffDayQuestionSchema>;

export const staffDayResponseSchema = z.object({
  today: z.string(),
  tomorrow: z.string(),
  /** Whose day this is: one technician (the signed-in one, or the manager's pick) or the whole company. */
  scope: z.discriminatedUnion("kind", [
    z.object({ kind: z.literal("technician"), technicianId: z.number().int(), name: z.string() }),
    z.object({ kind: z.literal("company") }),
  ]),
  visitsToday: z.array(staffDayVisitSchema),
  visitsTomorrow: z.array(staffDayVisitSchema),
  /** Follow-ups whose day has passed, not done: oldest first. */
  overdueVisits: z.array(staffDayVisitSchema),
  /** Open questions in scope (assigned to the technician, or all for the company), oldest first. */
  questions: z.array(staffDayQuestionSchema),
  /** Open questions nobody has taken yet (company-wide), so a technician knows the queue needs hands. */
  unassignedQuestions: z.number().int(),
  /** Staff a manager can pick from; empty for technicians. */
  technicians: z.array(z.object({ id: z.number().int(), name: z.string() })),
});
export type StaffDayResponse = z.infer<typeof staffDayResponseSchema>;
