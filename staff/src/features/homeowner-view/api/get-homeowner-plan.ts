import { queryOptions, useQuery } from "@tanstack/react-query";
import { planResponseSchema, type StoredPlan } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";

/** The homeowner's whole plan, through the same read the portal uses. */
export async function getHomeownerPlan(planId: number, signal?: AbortSignal): Promise<StoredPlan> {
  const { plan } = await apiFetch(`/api/plans/${planId}`, { schema: planResponseSchema, signal });
  return plan;
}

export function homeownerPlanQueryOptions(planId: number) {
  return queryOptions({ queryKey: ["homeowner-view", planId, "plan"] as const, queryFn: ({ signal }) => getHomeownerPlan(planId, signal) });
}

export function useHomeownerPlan(planId: number) {
  return useQuery(homeownerPlanQueryOptions(planId));
}
