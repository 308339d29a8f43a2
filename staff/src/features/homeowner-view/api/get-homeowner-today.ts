import { queryOptions, useQuery } from "@tanstack/react-query";
import { todayResponseSchema, type TodayResponse } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";

/** The homeowner's Today, through the same read the portal uses. */
export async function getHomeownerToday(planId: number, signal?: AbortSignal): Promise<TodayResponse> {
  return apiFetch(`/api/plans/${planId}/today`, { schema: todayResponseSchema, signal });
}

export function homeownerTodayQueryOptions(planId: number) {
  return queryOptions({ queryKey: ["homeowner-view", planId, "today"] as const, queryFn: ({ signal }) => getHomeownerToday(planId, signal) });
}

export function useHomeownerToday(planId: number) {
  return useQuery(homeownerTodayQueryOptions(planId));
}
