import { z } from "zod";

/**
 * GET /api/plans/:planId/homeowner-view (staff): what the staff app adds to the homeowner's own
 * Today and plan reads when staff look at them read only: whose plan it is, and who marked each
 * settled step done or skipped (the homeowner, or staff on their behalf).
 */
export const stepChangeSchema = z.object({
  stepId: z.number().int(),
  state: z.enum(["done", "skipped"]),
  changedAt: z.string().nullable(),
  /** Null when the person's account was removed. */
  byName: z.string().nullable(),
  byRole: z.enum(["customer", "technician", "manager"]).nullable(),
});
export type StepChange = z.infer<typeof stepChangeSchema>;

export const homeownerViewResponseSchema = z.object({
  homeowner: z.object({ customerId: z.number().int(), name: z.string(), phone: z.string().nullable(), email: z.string().nullable() }),
  stepChanges: z.array(stepChangeSchema),
});
export type HomeownerViewResponse = z.infer<typeof homeownerViewResponseSchema>;
