import { keepPreviousData, queryOptions, skipToken, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import type { PlanInputRaw } from "#shared/engine/index";
import { apiFetch } from "#shared/ui/index";

/** Only what the places page compares of a plan. */
const sampleSchema = z.object({
  steps: z.array(z.object({ key: z.string(), date: z.string(), kind: z.string(), title: z.string() })),
  warnings: z.array(z.object({ code: z.string(), audience: z.enum(["crew", "homeowner"]), severity: z.enum(["risk", "caution", "info"]), message: z.string() })),
});
export type PlaceSamplePlan = z.infer<typeof sampleSchema>;

export async function previewPlaceSample(input: PlanInputRaw, signal?: AbortSignal): Promise<PlaceSamplePlan> {
  const { plan } = await apiFetch("/api/plans/preview", { method: "POST", body: input, schema: z.object({ plan: sampleSchema }), signal });
  return plan;
}

/** Keyed by the whole input; the same input always gives the same plan. `null`: nothing to ask yet. */
export function placeSampleQueryOptions(input: PlanInputRaw | null) {
  return queryOptions({
    queryKey: ["plans", "preview", "place-sample", input] as const,
    queryFn: input ? ({ signal }) => previewPlaceSample(input, signal) : skipToken,
    placeholderData: keepPreviousData,
    staleTime: 5 * 60_000,
  });
}

export function usePlaceSample(input: PlanInputRaw | null) {
  return useQuery(placeSampleQueryOptions(input));
}
