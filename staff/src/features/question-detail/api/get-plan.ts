import { queryOptions, useQuery } from "@tanstack/react-query";
import { planResponseSchema, type StoredPlan } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";

/** One care plan with its phases and step states: where the homeowner is today. */
export async function getPlan(planId: number, signal?: AbortSignal): Promise<StoredPlan> {
  const { plan } = await apiFetch(`/api/plans/${planId}`, { schema: planResponseSchema, signal });
  return plan;
}

export function planQueryOptions(planId: number) {
  return queryOptions({
    queryKey: ["plans", planId] as const,
    queryFn: ({ signal }) => getPlan(planId, signal),
    staleTime: 60_000,
  });
}

export function usePlan(planId: number) {
  return useQuery(planQueryOptions(planId));
}
