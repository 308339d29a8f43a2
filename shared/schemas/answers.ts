import { z } from "zod";
import { questionTextSchema } from "./questions.ts";

/**
 * A technician's or manager's answer in a plan's thread: POST /api/plans/:planId/answers,
 * as JSON, or as multipart/form-data with the same fields and at most one file in `photos`.
 * `resolve` marks the plan's open questions answered (it leaves the question queue).
 */
export const answerSchema = questionTextSchema.extend({
  // Multipart sends every field as text, so "true"/"false" are accepted as well as booleans.
  resolve: z.union([z.boolean(), z.stringbool()]).optional(),
});
export type AnswerInput = z.infer<typeof answerSchema>;

export const answerPhotoLimit = 1;
