import { queryOptions, useQuery } from "@tanstack/react-query";
import { teamResponseSchema, type TeamMember } from "#shared/schemas/team";
import { apiFetch } from "#shared/ui/index";

/** Staff who can take a follow-up visit. The list is for managers only; technicians book for themselves. */
export async function getTeam(signal?: AbortSignal): Promise<TeamMember[]> {
  const { members } = await apiFetch("/api/team", { schema: teamResponseSchema, signal });
  return members.filter((member) => member.active);
}

export function teamQueryOptions() {
  return queryOptions({ queryKey: ["team", "assignable"] as const, queryFn: ({ signal }) => getTeam(signal), staleTime: 5 * 60_000 });
}

export function useTeam(enabled: boolean) {
  return useQuery({ ...teamQueryOptions(), enabled });
}
