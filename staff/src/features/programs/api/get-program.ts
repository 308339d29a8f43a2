import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { programSettingsSchema, type NumericSettingKey, type ProgramSettings } from "#shared/engine/index";
import { apiFetch } from "#shared/ui/index";

const boundSchema = z.object({
  default: z.number(),
  min: z.number(),
  max: z.number(),
  integer: z.boolean(),
  unit: z.string(),
  why: z.string(),
  source: z.string(),
  provenance: z.enum(["published", "common practice", "from memory"]),
});
export type Bound = z.infer<typeof boundSchema>;
export type Bounds = Record<NumericSettingKey, Bound>;

const responseSchema = z.object({
  version: z.number().int(),
  settings: programSettingsSchema,
  bounds: z.record(z.string(), boundSchema),
});

export interface ProgramWithBounds {
  version: number;
  settings: ProgramSettings;
  /** The engine's safe bounds, each with why, source and how sure we are. */
  bounds: Partial<Bounds>;
}

export async function getProgram(signal?: AbortSignal): Promise<ProgramWithBounds> {
  return apiFetch("/api/programs/current", { schema: responseSchema, signal });
}

/** Under ["programs"], so saving a version refreshes this and every other view of the program. */
export function programQueryOptions() {
  return queryOptions({
    // Not ["programs", "current"]: the plan preview caches a different shape under that key.
    queryKey: ["programs", "current", "with-bounds"] as const,
    queryFn: ({ signal }) => getProgram(signal),
  });
}

export function useProgram() {
  return useQuery(programQueryOptions());
}
