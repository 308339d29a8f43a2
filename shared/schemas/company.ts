import { z } from "zod";
import { recordId } from "./ids.ts";

/**
 * Public facts about the lawn-care company, for pages shown before sign-in (e.g. "This
 * Google account isn't on the staff list of …") and for the homeowner's header and printed
 * plan, so it is the company, not the tool, that speaks to the homeowner.
 * GET /api/company → 200 { company }, no sign-in needed; signed in, it is the person's own company.
 */
export const publicCompanySchema = z.object({
  id: recordId,
  name: z.string(),
  /** The office in E.164, for tap-to-call and tap-to-text; null until a manager sets it. */
  phone: z.string().nullable(),
  /** Path of the public logo route, versioned by upload time so a new logo shows at once; null when none. */
  logoUrl: z.string().nullable(),
});
export const publicCompanyResponseSchema = z.object({ company: publicCompanySchema });
export type PublicCompany = z.infer<typeof publicCompanySchema>;

/** PATCH /api/company (managers): the office phone as typed; the server reads it as a phone number. Null or "" clears it. */
export const companyProfileUpdateSchema = z.object({
  phone: z.string().trim().max(40).nullable(),
});
export type CompanyProfileUpdate = z.infer<typeof companyProfileUpdateSchema>;

export const companyIdParamsSchema = z.object({ companyId: recordId });

/** The logo is shown small (header, e-mail, printed plan): this bounds the stored copy. */
export const logoLimits = { maxBytes: 5 * 1024 * 1024, maxSide: 512 } as const;
