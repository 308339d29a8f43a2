import { useMutation, useQueryClient } from "@tanstack/react-query";
import { planResponseSchema, type StoredPlan } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "../../../common/api/query-keys.ts";

export async function reportSprouts(planId: number, onDay: number): Promise<StoredPlan> {
  const { plan } = await apiFetch(`/api/plans/${planId}/observations`, {
    method: "POST",
    body: { kind: "sprouts_seen", onDay },
    schema: planResponseSchema,
  });
  return plan;
}

/** Sprouts seen moves the plan on (watering changes); the server recomputes the future steps. */
export function useReportSprouts(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (onDay: number) => reportSprouts(planId, onDay),
    onSuccess: (plan) => {
      queryClient.setQueryData(portalKeys.plan(planId), plan);
      void queryClient.invalidateQueries({ queryKey: portalKeys.today(planId) });
    },
  });
}
