import { queryOptions, useQuery } from "@tanstack/react-query";
import { homeownerViewResponseSchema, type HomeownerViewResponse } from "#shared/schemas/homeowner-view";
import { apiFetch } from "#shared/ui/index";

/** Whose plan it is and who marked each step done or skipped (the portal does not show this). */
export async function getStepChanges(planId: number, signal?: AbortSignal): Promise<HomeownerViewResponse> {
  return apiFetch(`/api/plans/${planId}/homeowner-view`, { schema: homeownerViewResponseSchema, signal });
}

export function stepChangesQueryOptions(planId: number) {
  return queryOptions({ queryKey: ["homeowner-view", planId, "changes"] as const, queryFn: ({ signal }) => getStepChanges(planId, signal) });
}

export function useStepChanges(planId: number) {
  return useQuery(stepChangesQueryOptions(planId));
}
