import { z } from "zod";
import { recordId } from "./ids.ts";

/**
 * GET /api/my/unread → what the company has written to the signed-in homeowner that they
 * have not opened yet, per plan (plans with nothing new are left out). Counted like the
 * thread's "new" marks: answers and messages from the company, never staff-only notes.
 */
export const unreadResponseSchema = z.object({
  plans: z.array(z.object({ planId: recordId, unread: z.number().int().positive() })),
  total: z.number().int().nonnegative(),
});
export type UnreadResponse = z.infer<typeof unreadResponseSchema>;
