import { queryOptions, useQuery } from "@tanstack/react-query";
import { planListResponseSchema, type PlanHeader } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "./query-keys.ts";

export async function getMyPlans(signal?: AbortSignal): Promise<PlanHeader[]> {
  const { plans } = await apiFetch("/api/my/plans", { schema: planListResponseSchema, signal });
  return plans;
}

export function myPlansQueryOptions() {
  return queryOptions({ queryKey: portalKeys.myPlans, queryFn: ({ signal }) => getMyPlans(signal) });
}

export function useMyPlans() {
  return useQuery(myPlansQueryOptions());
}
