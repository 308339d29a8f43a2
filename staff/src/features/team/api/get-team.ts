import { queryOptions, useQuery } from "@tanstack/react-query";
import { teamResponseSchema, type TeamMember } from "#shared/schemas/team";
import { apiFetch } from "#shared/ui/index";

export async function getTeam(signal?: AbortSignal): Promise<TeamMember[]> {
  const { members } = await apiFetch("/api/team", { schema: teamResponseSchema, signal });
  return members;
}

/** ["team"] holds the member list in this shape everywhere (the follow-ups screen reads it for its technician picker). */
export const teamKey = ["team"] as const;

export function teamQueryOptions() {
  return queryOptions({ queryKey: teamKey, queryFn: ({ signal }) => getTeam(signal) });
}

export function useTeam() {
  return useQuery(teamQueryOptions());
}
