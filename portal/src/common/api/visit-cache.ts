import type { QueryClient } from "@tanstack/react-query";
import type { PlanVisit } from "#shared/schemas/follow-ups";
import { portalKeys } from "./query-keys.ts";

/** After the homeowner answers a visit: the visit as the server now has it, and a fresh conversation. */
export function applyVisitAnswer(queryClient: QueryClient, planId: number, visit: PlanVisit) {
  queryClient.setQueryData<PlanVisit[]>(portalKeys.visits(planId), (visits) => visits?.map((v) => (v.id === visit.id ? visit : v)));
  void queryClient.invalidateQueries({ queryKey: portalKeys.thread(planId) });
}
