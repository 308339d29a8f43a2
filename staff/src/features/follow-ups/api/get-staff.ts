import { queryOptions, useQuery } from "@tanstack/react-query";
import { teamResponseSchema, type TeamMember } from "#shared/schemas/team";
import { apiFetch } from "#shared/ui/index";

/** The company's staff, to pick a technician from. Same key and shape as the team screen's list, so they share a cache. */
export async function getStaff(signal?: AbortSignal): Promise<TeamMember[]> {
  const { members } = await apiFetch("/api/team", { schema: teamResponseSchema, signal });
  return members;
}

export function staffQueryOptions() {
  return queryOptions({ queryKey: ["team"] as const, queryFn: ({ signal }) => getStaff(signal), staleTime: 60_000 });
}

export function useStaff() {
  return useQuery(staffQueryOptions());
}
