import { queryOptions, useQuery } from "@tanstack/react-query";
import { publicCompanyResponseSchema, type PublicCompany } from "#shared/schemas/company";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "./query-keys.ts";

export async function getCompany(signal?: AbortSignal): Promise<PublicCompany> {
  const { company } = await apiFetch("/api/company", { schema: publicCompanyResponseSchema, signal });
  return company;
}

export function companyQueryOptions() {
  // A manager changes the logo or phone rarely; an hour old is fresh enough for a header.
  return queryOptions({ queryKey: portalKeys.company, queryFn: ({ signal }) => getCompany(signal), staleTime: 60 * 60 * 1000 });
}

/** The homeowner's lawn-care company: name, office phone and logo, for the header and the printed plan. */
export function useCompany(enabled = true) {
  return useQuery({ ...companyQueryOptions(), enabled });
}
