import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { followUpListSchema, type FollowUp, type FollowUpFilter, type FollowUpListQuery } from "#shared/schemas/follow-ups";
import { apiFetch } from "#shared/ui/index";

/** Filters as URL query text; the list and the CSV export take the same ones. */
export function followUpSearch(query: Partial<FollowUpFilter> & { limit?: number; offset?: number }): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== "") search.set(key, String(value));
  }
  return search.toString();
}

export async function getFollowUps(query: FollowUpListQuery, signal?: AbortSignal): Promise<{ rows: FollowUp[]; total: number }> {
  return apiFetch(`/api/follow-ups?${followUpSearch(query)}`, { schema: followUpListSchema, signal });
}

export const followUpsKey = ["follow-ups"] as const;

export function followUpsQueryOptions(query: FollowUpListQuery) {
  return queryOptions({
    queryKey: [...followUpsKey, "list", query] as const,
    queryFn: ({ signal }) => getFollowUps(query, signal),
    // The old page stays on screen while the next one loads, so paging doesn't flash empty.
    placeholderData: keepPreviousData,
  });
}

export function useFollowUps(query: FollowUpListQuery) {
  return useQuery(followUpsQueryOptions(query));
}
