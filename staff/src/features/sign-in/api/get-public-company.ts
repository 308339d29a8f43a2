import { queryOptions, useQuery } from "@tanstack/react-query";
import { publicCompanyResponseSchema, type PublicCompany } from "#shared/schemas/company";
import { apiFetch } from "#shared/ui/index";

export async function getPublicCompany(signal?: AbortSignal): Promise<PublicCompany> {
  const { company } = await apiFetch("/api/company", { schema: publicCompanyResponseSchema, signal });
  return company;
}

export function publicCompanyQueryOptions() {
  return queryOptions({
    queryKey: ["company", "public"] as const,
    queryFn: ({ signal }) => getPublicCompany(signal),
    staleTime: Infinity,
  });
}

/** The company name for messages shown before sign-in; pages must cope when it's unavailable. */
export function usePublicCompany(enabled = true) {
  return useQuery({ ...publicCompanyQueryOptions(), enabled });
}
