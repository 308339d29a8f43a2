import { useMutation, useQueryClient } from "@tanstack/react-query";
import { planVisitResponseSchema, type AnotherDay, type PlanVisit } from "#shared/schemas/follow-ups";
import { apiFetch } from "#shared/ui/index";
import { applyVisitAnswer } from "./visit-cache.ts";

export async function askAnotherDay(visitId: number, request: AnotherDay): Promise<PlanVisit> {
  const { visit } = await apiFetch(`/api/follow-ups/${visitId}/another-day`, { method: "POST", body: request, schema: planVisitResponseSchema });
  return visit;
}

/** The request becomes a message in the plan's conversation, so the thread is read again. */
export function useAskAnotherDay(planId: number, visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: (request: AnotherDay) => askAnotherDay(visitId, request), onSuccess: (visit) => applyVisitAnswer(queryClient, planId, visit) });
}
