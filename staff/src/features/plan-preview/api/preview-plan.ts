import { keepPreviousData, queryOptions, skipToken, useQuery } from "@tanstack/react-query";
import type { Plan, PlanInputRaw } from "#shared/engine/index";
import { apiFetch } from "#shared/ui/index";
import type { CurrentProgram } from "./get-current-program.ts";
import { previewPlanResponseSchema } from "./plan-schema.ts";

/** Asks the server to run the engine on a hypothetical visit; nothing is stored. */
export async function previewPlan(input: PlanInputRaw, signal?: AbortSignal): Promise<Plan> {
  const { plan } = await apiFetch("/api/plans/preview", { method: "POST", body: input, schema: previewPlanResponseSchema, signal });
  return plan;
}

/**
 * Keyed by the whole (already debounced and client-checked) input, so going back to
 * an earlier value answers from the cache. The previous plan stays on screen while
 * the next one loads, so the timeline doesn't flash empty on every keystroke.
 * `null` means "nothing to ask yet".
 */
export function previewPlanQueryOptions(input: PlanInputRaw | null) {
  return queryOptions({
    queryKey: ["plans", "preview", input] as const,
    queryFn: input ? ({ signal }) => previewPlan(input, signal) : skipToken,
    placeholderData: keepPreviousData,
    // The same input and program always give the same plan.
    staleTime: 5 * 60_000,
  });
}

/**
 * The preview for a checked input, run with the company's current program. Waits
 * for the program so the plan shows the version the company really uses.
 */
export function usePreviewPlan(input: PlanInputRaw | null, program: CurrentProgram | undefined) {
  const body: PlanInputRaw | null = input && program ? { ...input, program: { ...program.settings, version: program.version } } : null;
  return useQuery(previewPlanQueryOptions(body));
}
