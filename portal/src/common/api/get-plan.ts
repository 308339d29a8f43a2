import { queryOptions, useQuery } from "@tanstack/react-query";
import { planResponseSchema, type StoredPlan } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "./query-keys.ts";

export async function getPlan(planId: number, signal?: AbortSignal): Promise<StoredPlan> {
  const { plan } = await apiFetch(`/api/plans/${planId}`, { schema: planResponseSchema, signal });
  return plan;
}

export function planQueryOptions(planId: number) {
  return queryOptions({ queryKey: portalKeys.plan(planId), queryFn: ({ signal }) => getPlan(planId, signal) });
}

export function usePlan(planId: number | undefined) {
  return useQuery({ ...planQueryOptions(planId ?? 0), enabled: planId !== undefined });
}
