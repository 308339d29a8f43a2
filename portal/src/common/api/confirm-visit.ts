import { useMutation, useQueryClient } from "@tanstack/react-query";
import { planVisitResponseSchema, type PlanVisit } from "#shared/schemas/follow-ups";
import { apiFetch } from "#shared/ui/index";
import { applyVisitAnswer } from "./visit-cache.ts";

export async function confirmVisit(visitId: number): Promise<PlanVisit> {
  const { visit } = await apiFetch(`/api/follow-ups/${visitId}/confirm`, { method: "POST", body: {}, schema: planVisitResponseSchema });
  return visit;
}

export function useConfirmVisit(planId: number, visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: () => confirmVisit(visitId), onSuccess: (visit) => applyVisitAnswer(queryClient, planId, visit) });
}
