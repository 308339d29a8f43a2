import { queryOptions, useQueries } from "@tanstack/react-query";
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

/**
 * The plans behind the queue's questions (plan day and service type per row). The queue
 * doesn't carry them, so each plan is asked for once and shared with the question page.
 */
export function useQueuePlans(planIds: readonly number[]): { plans: Map<number, StoredPlan>; failed: Set<number> } {
  return useQueries({
    queries: planIds.map((id) => planQueryOptions(id)),
    combine: (results) => {
      const plans = new Map<number, StoredPlan>();
      const failed = new Set<number>();
      results.forEach((result, i) => {
        if (result.data) plans.set(result.data.id, result.data);
        else if (result.isError) failed.add(planIds[i]!);
      });
      return { plans, failed };
    },
  });
}
