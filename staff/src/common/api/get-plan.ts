import { queryOptions, useQuery } from "@tanstack/react-query";
import { planResponseSchema, type StoredPlan } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";

/** One care plan as staff read it: phases, step states, and the crew's warnings as well as the homeowner's. */
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
