import { z } from "zod";
import { bigRecordId, recordId } from "./ids.ts";

/**
 * Where the homeowner is in the plan today, on the lawn's own calendar. `phase` is the
 * engine's phase holding today (null before the first or after the last); days count the
 * first day as day 1; `dayOfPlan` counts from the visit day and is null before the visit.
 */
export const queuePlanDaySchema = z.object({
  phase: z.string().nullable(),
  dayOfPhase: z.number().int().nullable(),
  dayOfPlan: z.number().int().nullable(),
});
export type QueuePlanDay = z.infer<typeof queuePlanDaySchema>;

/**
 * The staff question queue: GET /api/questions/open (technicians and managers), every open
 * question of the company: those with no answer after them first, then oldest waiting
 * first. `overdue` is past the company's answer target.
 */
export const openQuestionSchema = z.object({
  messageId: z.number().int(),
  planId: z.number().int(),
  customerName: z.string(),
  street: z.string(),
  text: z.string(),
  photoCount: z.number().int(),
  /** Thumbnail of the first photo, if any (served only to staff and the owner). */
  thumbUrl: z.string().nullable(),
  askedAt: z.string(),
  overdue: z.boolean(),
  /** The services of the visit the plan was made from. */
  services: z.array(z.string()),
  planDay: queuePlanDaySchema,
  assignedToId: z.number().int().nullable(),
  assignedToName: z.string().nullable(),
  /** The latest staff answer in the conversation (possibly before this question), or null. */
  lastAnsweredAt: z.string().nullable(),
  /** When the question was asked: the clock the queue is ordered by. */
  waitingSince: z.string(),
});
export type OpenQuestion = z.infer<typeof openQuestionSchema>;

export const openQuestionsResponseSchema = z.object({ questions: z.array(openQuestionSchema) });
export type OpenQuestionsResponse = z.infer<typeof openQuestionsResponseSchema>;

/** POST /api/questions/:messageId/assign */
export const questionMessageParamsSchema = z.object({ messageId: bigRecordId });
export const assignQuestionSchema = z.object({
  /** The staff member to assign the question to, or null to unassign. */
  userId: recordId.nullable(),
});
export type AssignQuestionInput = z.infer<typeof assignQuestionSchema>;
export const assignQuestionResponseSchema = z.object({
  messageId: z.number().int(),
  assignedToId: z.number().int().nullable(),
  assignedToName: z.string().nullable(),
});
export type AssignQuestionResponse = z.infer<typeof assignQuestionResponseSchema>;

/**
 * GET /api/questions/answered: questions of the company a staff answer followed in the last
 * `days` days, the most recently answered first, with who answered.
 */
export const answeredQuestionsQuerySchema = z.object({
  days: z.coerce.number().int().min(1).max(30).default(7),
});
/** A homeowner's question as staff lists show it: who asked, about which lawn, and when. */
export const questionSummarySchema = z.object({
  messageId: z.number().int(),
  planId: z.number().int(),
  customerName: z.string(),
  street: z.string(),
  text: z.string(),
  askedAt: z.string(),
});
export const answeredQuestionSchema = questionSummarySchema.extend({
  /** When the first staff answer followed the question. */
  answeredAt: z.string(),
  answeredByName: z.string().nullable(),
  answerText: z.string(),
  /** Closed by staff (it left the open queue); false while the question stays open. */
  resolved: z.boolean(),
});
export type AnsweredQuestion = z.infer<typeof answeredQuestionSchema>;
export const answeredQuestionsResponseSchema = z.object({ days: z.number().int(), questions: z.array(answeredQuestionSchema) });
export type AnsweredQuestionsResponse = z.infer<typeof answeredQuestionsResponseSchema>;
