import { z } from "zod";

/**
 * The staff question queue: GET /api/questions/open (technicians and managers), every open
 * question of the company, oldest first. `overdue` is past the company's answer target.
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
});
export type OpenQuestion = z.infer<typeof openQuestionSchema>;

export const openQuestionsResponseSchema = z.object({ questions: z.array(openQuestionSchema) });
export type OpenQuestionsResponse = z.infer<typeof openQuestionsResponseSchema>;
