import { useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { storedStepSchema, type StepState, type StoredPlan, type StoredStep, type TodayResponse } from "#shared/schemas/plans";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "./query-keys.ts";

const stepResponseSchema = z.object({ step: storedStepSchema });

export interface ChangeStepStateInput {
  stepId: number;
  state: StepState;
  reason?: string;
}

export async function changeStepState(planId: number, { stepId, state, reason }: ChangeStepStateInput): Promise<StoredStep> {
  const { step } = await apiFetch(`/api/plans/${planId}/steps/${stepId}/state`, {
    method: "PUT",
    body: reason ? { state, reason } : { state },
    schema: stepResponseSchema,
  });
  return step;
}

function withStepState(step: StoredStep, input: ChangeStepStateInput): StoredStep {
  if (step.id !== input.stepId) return step;
  return {
    ...step,
    state: input.state,
    skipReason: input.state === "skipped" ? (input.reason ?? null) : null,
    stateChangedAt: new Date().toISOString(),
  };
}

/** The step appears both in "today" and in the whole plan; both caches change together. */
function applyToCaches(queryClient: QueryClient, planId: number, input: ChangeStepStateInput) {
  queryClient.setQueryData<TodayResponse>(portalKeys.today(planId), (today) =>
    today ? { ...today, steps: today.steps.map((s) => withStepState(s, input)) } : today,
  );
  queryClient.setQueryData<StoredPlan>(portalKeys.plan(planId), (plan) =>
    plan ? { ...plan, steps: plan.steps.map((s) => withStepState(s, input)) } : plan,
  );
}

/**
 * Done / skipped / undo, shown at once (a tap on the lawn must feel instant) and rolled back
 * if the server refuses, so the screen never claims a state the plan doesn't have.
 */
export function useChangeStepState(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ChangeStepStateInput) => changeStepState(planId, input),
    onMutate: async (input) => {
      // A refetch already in flight would land after our optimistic change and undo it.
      await queryClient.cancelQueries({ queryKey: portalKeys.plan(planId) });
      const previousToday = queryClient.getQueryData<TodayResponse>(portalKeys.today(planId));
      const previousPlan = queryClient.getQueryData<StoredPlan>(portalKeys.plan(planId));
      applyToCaches(queryClient, planId, input);
      return { previousToday, previousPlan };
    },
    onError: (_error, _input, context) => {
      if (context?.previousToday) queryClient.setQueryData(portalKeys.today(planId), context.previousToday);
      if (context?.previousPlan) queryClient.setQueryData(portalKeys.plan(planId), context.previousPlan);
    },
    onSettled: () => {
      // Progress counts and reminders change server-side too.
      void queryClient.invalidateQueries({ queryKey: portalKeys.plan(planId) });
      void queryClient.invalidateQueries({ queryKey: portalKeys.myPlans });
    },
  });
}
