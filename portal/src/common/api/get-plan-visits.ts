import { queryOptions, useQuery } from "@tanstack/react-query";
import { planVisitsResponseSchema, type PlanVisit } from "#shared/schemas/follow-ups";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "./query-keys.ts";

export async function getPlanVisits(planId: number, signal?: AbortSignal): Promise<PlanVisit[]> {
  const { visits } = await apiFetch(`/api/plans/${planId}/visits`, { schema: planVisitsResponseSchema, signal });
  return visits;
}

export function planVisitsQueryOptions(planId: number) {
  return queryOptions({ queryKey: portalKeys.visits(planId), queryFn: ({ signal }) => getPlanVisits(planId, signal) });
}

export function usePlanVisits(planId: number) {
  return useQuery(planVisitsQueryOptions(planId));
}
