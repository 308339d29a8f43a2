import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { programSettingsSchema, type ProgramSettings } from "#shared/engine/index";
import { apiFetch } from "#shared/ui/index";

/*
 * The company's care program now in force. The bounds come along in the answer but
 * this page only needs the settings and their version.
 */
const currentProgramResponseSchema = z.object({
  version: z.number().int(),
  settings: programSettingsSchema,
  bounds: z.record(z.string(), z.unknown()),
});

export interface CurrentProgram {
  version: number;
  settings: ProgramSettings;
}

export async function getCurrentProgram(signal?: AbortSignal): Promise<CurrentProgram> {
  const { version, settings } = await apiFetch("/api/programs/current", { schema: currentProgramResponseSchema, signal });
  return { version, settings };
}

export function currentProgramQueryOptions() {
  return queryOptions({
    queryKey: ["programs", "current"] as const,
    queryFn: ({ signal }) => getCurrentProgram(signal),
  });
}

export function useCurrentProgram() {
  return useQuery(currentProgramQueryOptions());
}
