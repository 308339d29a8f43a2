import { queryOptions, useQuery } from "@tanstack/react-query";
import { todayResponseSchema, type TodayResponse } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "../../../common/api/query-keys.ts";

export function getToday(planId: number, signal?: AbortSignal): Promise<TodayResponse> {
  return apiFetch(`/api/plans/${planId}/today`, { schema: todayResponseSchema, signal });
}

export function todayQueryOptions(planId: number) {
  return queryOptions({ queryKey: portalKeys.today(planId), queryFn: ({ signal }) => getToday(planId, signal) });
}

/** "Today" turns over at midnight on the lawn: refetch when the homeowner comes back to the app. */
export function useToday(planId: number) {
  return useQuery({ ...todayQueryOptions(planId), refetchOnWindowFocus: "always" });
}
