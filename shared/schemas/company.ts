import { z } from "zod";

/**
 * Public facts about the lawn-care company running this Sproutline, for pages shown
 * before sign-in (e.g. "This Google account isn't on the staff list of …").
 * GET /api/company → 200 { company: { name } }, no sign-in needed.
 */
export const publicCompanySchema = z.object({ name: z.string() });
export const publicCompanyResponseSchema = z.object({ company: publicCompanySchema });
export type PublicCompany = z.infer<typeof publicCompanySchema>;
