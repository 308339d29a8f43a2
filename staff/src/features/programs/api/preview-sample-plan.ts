import { keepPreviousData, queryOptions, skipToken, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import type { PlanInputRaw } from "#shared/engine/index";
import { apiFetch } from "#shared/ui/index";

/** Only what the programs page shows of a plan; the rest of the engine's answer is ignored. */
const samplePlanSchema = z.object({
  meta: z.object({
    programVersion: z.number(),
    visitDate: z.string(),
    phases: z.array(z.object({ phase: z.string(), start: z.string(), end: z.string() })),
    firstMowDate: z.string().nullable(),
    germinationWateringEnds: z.string().nullable(),
    planEnds: z.string(),
  }),
  steps: z.array(z.object({ date: z.string(), kind: z.string() })),
  holdOffs: z.array(z.object({ kind: z.string(), start: z.string(), end: z.string() })),
  warnings: z.array(z.object({ code: z.string(), audience: z.enum(["crew", "homeowner"]), severity: z.enum(["risk", "caution", "info"]), message: z.string() })),
});
export type SamplePlan = z.infer<typeof samplePlanSchema>;

export async function previewSamplePlan(input: PlanInputRaw, signal?: AbortSignal): Promise<SamplePlan> {
  const { plan } = await apiFetch("/api/plans/preview", { method: "POST", body: input, schema: z.object({ plan: samplePlanSchema }), signal });
  return plan;
}

/** Keyed by the whole input: going back to earlier values answers from the cache. `null`: nothing to ask yet. */
export function samplePlanQueryOptions(input: PlanInputRaw | null) {
  return queryOptions({
    queryKey: ["plans", "preview", "program-sample", input] as const,
    queryFn: input ? ({ signal }) => previewSamplePlan(input, signal) : skipToken,
    placeholderData: keepPreviousData,
    // The same input always gives the same plan.
    staleTime: 5 * 60_000,
  });
}

export function useSamplePlan(input: PlanInputRaw | null) {
  return useQuery(samplePlanQueryOptions(input));
}
