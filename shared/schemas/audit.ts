import { z } from "zod";

export const auditQuerySchema = z.object({
  subjectType: z.string().max(40).optional(),
  subjectId: z.string().max(40).optional(),
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

export const auditEntrySchema = z.object({
  id: z.number().int(),
  at: z.string(),
  action: z.string(),
  subjectType: z.string().nullable(),
  subjectId: z.string().nullable(),
  method: z.string().nullable(),
  path: z.string().nullable(),
  ip: z.string().nullable(),
  actorName: z.string().nullable(),
  actorRole: z.string().nullable(),
});
export const auditListSchema = z.object({ entries: z.array(auditEntrySchema) });
