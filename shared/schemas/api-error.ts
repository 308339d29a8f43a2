import { z } from "zod";

/** Every API error has this shape (DESIGN.md §3), so clients can show it in place. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
    /** The server's X-Request-Id, to quote when reporting a problem. */
    requestId: z.string().optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;
