import { z } from "zod";

/**
 * Every kind of record the audit log has entries about: the part of an action before the dot
 * ("visit.logged" is about a visit). The staff filter offers each; a route audited under a new
 * kind fails `server/features/audit/kinds.test.ts` until it is added here.
 */
export const auditSubjectTypes = [
  "plan",
  "visit",
  "follow_up",
  "question",
  "customer",
  "property",
  "customers",
  "program",
  "place",
  "team",
  "unmatched_inbound",
  "account",
] as const;
export type AuditSubjectType = (typeof auditSubjectTypes)[number];

export const auditQuerySchema = z.object({
  subjectType: z.enum(auditSubjectTypes).optional(),
  subjectId: z.string().max(40).optional(),
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

export const auditEntrySchema = z.object({
  id: z.number().int(),
  at: z.string(),
  action: z.string(),
  /** Who did what for whom, in words ("Marco Ibsen logged a visit for Hana Sørbye, 19 Cobble Row"). */
  sentence: z.string(),
  subjectType: z.string().nullable(),
  subjectId: z.string().nullable(),
  /** The homeowner the record belongs to, and the lawn's street, where the record has one. */
  customerName: z.string().nullable(),
  street: z.string().nullable(),
  method: z.string().nullable(),
  path: z.string().nullable(),
  ip: z.string().nullable(),
  actorName: z.string().nullable(),
  actorRole: z.string().nullable(),
});
export const auditListSchema = z.object({ entries: z.array(auditEntrySchema) });
