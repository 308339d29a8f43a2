import { queryOptions, useQuery } from "@tanstack/react-query";
import { publicCompanyResponseSchema, type PublicCompany } from "#shared/schemas/company";
import { apiFetch } from "#shared/ui/index";

export async function getCompanyProfile(signal?: AbortSignal): Promise<PublicCompany> {
  const { company } = await apiFetch("/api/company", { schema: publicCompanyResponseSchema, signal });
  return company;
}

/** The signed-in manager's own company, as homeowners see it (name, office phone, logo). */
export const companyProfileKey = ["company", "profile"] as const;

export function companyProfileQueryOptions() {
  return queryOptions({ queryKey: companyProfileKey, queryFn: ({ signal }) => getCompanyProfile(signal) });
}

export function useCompanyProfile() {
  return useQuery(companyProfileQueryOptions());
}
